import { DOCUMENT_FIELD, upwellSchema, type DocumentState, type FigureResult, type UploadPreview } from '@upwell/common';
import { yDocToProsemirrorJSON } from '@tiptap/y-tiptap';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import * as Y from 'yjs';
import { writeDemoFiles } from '@upwell/demo-generator';
import { listRecipes, type DocJson } from '../src/notebook-files/recipe-refs';

type Auth = { Authorization: string };

/**
 * Uploads release 1 of the demo model run into a group through the HTTP
 * routes a person uses (upload, preview, import, zonal mean), optionally only
 * the series whose names `keep` accepts.
 */
export async function uploadDemoSeries(url: string, auth: Auth, groupId: string, keep: (name: string) => boolean = () => true): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'upwell-demo-files-'));
  const manifest = await writeDemoFiles(dir, { release: 1 });
  for (const { file } of manifest.files) {
    const series = manifest.series.filter((s) => s.file === file && keep(s.name));
    const fields = manifest.fields.filter((f) => f.file === file && keep(f.zonalMeanName));
    if (!series.length && !fields.length) continue;
    const preview = (await request(url).post(`/api/groups/${groupId}/uploads`).set(auth).attach('file', join(dir, file)).expect(201)).body as UploadPreview;
    const columns = series.map((s) => ({ column: s.column, skip: false, name: s.name, kind: s.kind, variable: s.variable, units: s.units, region: s.region, depthLayer: s.depthLayer, source: s.source }));
    const grids = fields.map((f) => ({ variable: f.variable, name: f.longName }));
    const imported = await request(url).post(`/api/uploads/${preview.uploadId}/import`).set(auth).send({ origin: series[0]?.origin ?? 'model-output', columns, grids }).expect(200);
    for (const [i, f] of fields.entries()) {
      await request(url).post(`/api/fields/${imported.body.fields[i].id}/reductions`).set(auth).send({ kind: 'zonal-mean', name: f.zonalMeanName, lat: f.lat, lon: f.lon }).expect(200);
    }
  }
}

/** A notebook's stored document as ProseMirror JSON, read through the document route. */
export async function documentJson(url: string, auth: Auth, notebookId: string): Promise<DocJson> {
  const state = (await request(url).get(`/api/notebooks/${notebookId}/document`).set(auth).expect(200)).body as DocumentState;
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Buffer.from(state.state, 'base64'));
  const json = yDocToProsemirrorJSON(doc, DOCUMENT_FIELD) as DocJson;
  upwellSchema().nodeFromJSON(json).check();
  return json;
}

/** Each live number of a document: its recipe and key. */
export function liveNumbers(doc: DocJson): { recipe: Record<string, unknown>; key: string }[] {
  const found: { recipe: Record<string, unknown>; key: string }[] = [];
  const walk = (n: unknown): void => {
    const node = n as { type?: string; attrs?: { recipe?: Record<string, unknown>; key?: string }; content?: unknown[] };
    if (node.type === 'liveNumber' && node.attrs?.recipe && node.attrs.key) found.push({ recipe: node.attrs.recipe, key: node.attrs.key });
    node.content?.forEach(walk);
  };
  walk(doc);
  return found;
}

/**
 * Computes every figure and live-number recipe of a notebook through the real
 * figure route; answers the results in document order and the live numbers
 * with the value each shows.
 */
export async function computeEveryRecipe(url: string, auth: Auth, notebookId: string) {
  const doc = await documentJson(url, auth, notebookId);
  const results: FigureResult[] = [];
  for (const recipe of listRecipes(doc)) {
    const res = await request(url).post(`/api/notebooks/${notebookId}/figures`).set(auth).send({ recipe });
    if (res.status !== 200) throw new Error(`figure ${recipe.kind} answered ${res.status}: ${JSON.stringify(res.body)}`);
    results.push(res.body as FigureResult);
  }
  const numbers = [];
  for (const n of liveNumbers(doc)) {
    const res = await request(url).post(`/api/notebooks/${notebookId}/figures`).set(auth).send({ recipe: n.recipe }).expect(200);
    const offered = (res.body as FigureResult).numbers.find((x) => x.key === n.key);
    numbers.push({ key: n.key, kind: String(n.recipe.kind), value: offered ? offered.value : undefined });
  }
  return { doc, results, numbers };
}
