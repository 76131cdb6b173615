import type { EntityManager } from '@mikro-orm/sqlite';
import type { ModuleRef } from '@nestjs/core';
import { notebookFileSchema, type NotebookView } from '@upwell/common';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { CommentsService } from '../../comments/comments.service';
import { FieldsService } from '../../fields/fields.service';
import { GroupsService } from '../../groups/groups.service';
import { NotebookFilesService } from '../../notebook-files/notebook-files.service';
import { NotebooksService } from '../../notebooks/notebooks.service';
import { Series } from '../../series/series.entity';
import { UploadsService } from '../../uploads/uploads.service';
import type { User } from '../../users/user.entity';
import { DEMO_GROUP_NAME } from '../demo-people';
import { demoRelease, type DemoUpload } from './demo-release';
import { DEMO_THREADS } from './demo-threads';
import { publishDemoSnapshot } from './demo-snapshot';
import { stageLikeUpload } from './staged-file';

/** The demo's four people. */
export interface DemoCast {
  lead: User;
  coAuthor: User;
  reviewer: User;
  reader: User;
}

/** What the seed works with. */
export interface SeedContext {
  moduleRef: ModuleRef;
  em: EntityManager;
  dataDir: string;
  cast: DemoCast;
  log: (message: string) => void;
}

/** Folder of the example notebooks, the same from src/ (tests) and dist/ (npm start). */
export const EXAMPLE_NOTEBOOKS_DIR = join(__dirname, '..', '..', '..', '..', 'example-notebooks');

/** The example notebooks the demo imports, in the order they are created. */
export const EXAMPLE_NOTEBOOK_FILES = ['event-analysis.upwell.json', 'methods-check.upwell.json'] as const;

/**
 * Everything after the people: the group, release 1 of the model run through
 * the upload service, the zonal mean through the fields service, the example
 * notebooks through the notebook-file import, roles, a snapshot, release 2 as
 * new versions, and the review threads.
 */
export async function seedDemoContent(ctx: SeedContext): Promise<void> {
  const get = <T>(type: new (...args: never[]) => T): T => ctx.moduleRef.get(type, { strict: false });
  const { lead, coAuthor, reviewer, reader } = ctx.cast;

  const groups = get(GroupsService);
  const group = await groups.create(lead, { name: DEMO_GROUP_NAME });
  for (const person of [coAuthor, reviewer, reader]) await groups.addMember(lead, group.id, { email: person.email, role: 'member' });
  ctx.log(`group “${DEMO_GROUP_NAME}” with ${4} people`);

  const release1 = await demoRelease(join(ctx.dataDir, 'demo', 'release-1'), 1);
  for (const upload of release1) await uploadRelease(ctx, group.id, upload, {});
  ctx.log(`release 1 uploaded: ${release1.map((u) => u.fileName).join(', ')}`);

  const files = get(NotebookFilesService);
  const notebooks: NotebookView[] = [];
  for (const name of EXAMPLE_NOTEBOOK_FILES) {
    const parsed = notebookFileSchema.parse(JSON.parse(await readFile(join(EXAMPLE_NOTEBOOKS_DIR, name), 'utf8')));
    notebooks.push(await files.import(lead, group.id, parsed));
  }
  const roles = get(NotebooksService);
  for (const nb of notebooks) {
    await roles.assignRole(lead, nb.id, coAuthor.id, { role: 'co-author' });
    await roles.assignRole(lead, nb.id, reviewer.id, { role: 'reviewer' });
    await roles.assignRole(lead, nb.id, reader.id, { role: 'reader' });
  }
  ctx.log(`example notebooks imported: ${notebooks.map((n) => `“${n.title}”`).join(', ')}`);

  const snapshot = await publishDemoSnapshot(ctx.moduleRef, lead, notebooks[0].id);
  ctx.log(`snapshot ${snapshot} of “${notebooks[0].title}” published`);

  // Release 2 revises the model output after the snapshot, so live figures and the snapshot differ.
  const release2 = await demoRelease(join(ctx.dataDir, 'demo', 'release-2'), 2);
  const byName = new Map((await ctx.em.find(Series, { group: group.id })).map((s) => [s.name, s]));
  for (const upload of release2.filter((u) => u.format === 'csv')) {
    const targets = Object.fromEntries(
      upload.columns.filter((c) => c.origin === 'model-output' && byName.has(c.name)).map((c) => [c.column, byName.get(c.name)!.id]),
    );
    if (Object.keys(targets).length) await uploadRelease(ctx, group.id, { ...upload, columns: upload.columns.filter((c) => c.column in targets) }, targets);
  }
  ctx.log('release 2 imported as new versions of the model-output series');

  const comments = get(CommentsService);
  const people = { lead, coAuthor, reviewer, reader };
  for (const t of DEMO_THREADS) {
    const notebook = notebooks[t.notebook];
    const thread = await comments.create(people[t.author], notebook.id, { anchor: { type: 'figure', figureId: t.figureId }, body: t.body, mentions: t.mentions.map((m) => people[m].id) });
    for (const r of t.replies) await comments.reply(people[r.author], notebook.id, thread.id, { body: r.body, mentions: r.mentions.map((m) => people[m].id) });
  }
  ctx.log(`${DEMO_THREADS.length} open review threads`);
}

/** One file through stage (preview) and import, mapped by the manifest, as the lead author. */
async function uploadRelease(ctx: SeedContext, groupId: string, upload: DemoUpload, targets: Record<string, string>): Promise<void> {
  const uploads = ctx.moduleRef.get(UploadsService, { strict: false });
  const preview = await uploads.stage(ctx.cast.lead, groupId, await stageLikeUpload(ctx.dataDir, upload.path), {});
  const offered = new Set([...(preview.csv?.series.map((s) => s.column) ?? []), ...(preview.netcdf?.variables.map((v) => v.name) ?? [])]);
  const missing = [...upload.columns.map((c) => c.column), ...upload.grids.map((g) => g.variable)].filter((c) => !offered.has(c));
  if (missing.length) throw new Error(`${upload.fileName}: the preview does not offer ${missing.join(', ')}`);
  const origin = upload.columns[0]?.origin ?? 'model-output';
  const result = await uploads.import(ctx.cast.lead, preview.uploadId, {
    origin,
    columns: upload.columns.map((c) => ({ column: c.column, skip: false as const, name: c.name, kind: c.kind, variable: c.variable, units: c.units, region: c.region, depthLayer: c.depthLayer, source: c.source, notes: c.description })),
    grids: upload.grids.map((g) => ({ variable: g.variable, name: g.name })),
    targets,
  });
  if (!upload.zonalMean) return;
  const field = result.fields[0];
  if (!field) throw new Error(`${upload.fileName}: no gridded field was kept`);
  const fields = ctx.moduleRef.get(FieldsService, { strict: false });
  await fields.reduce(ctx.cast.lead, field.id, { kind: 'zonal-mean', ...upload.zonalMean });
}
