import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable } from '@nestjs/common';
import {
  EDITOR_SCHEMA_VERSION,
  figureRecipeSchema,
  NOTEBOOK_FILE_FORMAT,
  NOTEBOOK_FILE_VERSION,
  type NotebookFile,
  type NotebookView,
  type PmJson,
} from '@upwell/common';
import { randomUUID } from 'node:crypto';
import * as Y from 'yjs';
import { describeIssues, type InputIssue } from '../common/zod-validation.pipe';
import { DocumentsService } from '../documents/documents.service';
import { renderDocument } from '../documents/document-render';
import { stateFromJson } from '../documents/initial-document';
import { liveNodeIssues } from '../documents/live-node-check';
import { NotebookDocument } from '../documents/notebook-document.entity';
import { EventSet, type StoredEvent } from '../event-sets/event-set.entity';
import { ZonalMeanField } from '../fields/field.entity';
import { GroupPolicy } from '../groups/group.policy';
import { Notebook, NotebookRoleAssignment } from '../notebooks/notebook.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { presentNotebook } from '../notebooks/notebook.presenter';
import { Series, SeriesVersion } from '../series/series.entity';
import type { User } from '../users/user.entity';
import { boundIds, keyFromFile, keyRefs, keyToFile, listNumberKeys, listRecipes, mapRecipes, recipeFromFile, recipeToFile, refFromName, usedRefs, type DocJson, type RefTables } from './recipe-refs';

/** What the export route sends: the file and the name to save it under. */
export interface ExportedNotebookFile {
  file: NotebookFile;
  fileName: string;
}

function refused(message: string, issues: InputIssue[]): BadRequestException {
  return new BadRequestException({ statusCode: 400, error: 'Bad Request', message, issues });
}

/** A file name from a notebook title: lower case, dashes, the format's ending. */
export function notebookFileName(title: string): string {
  const slug = refFromName(title, new Set(), 80);
  return `${slug === 'ref' ? 'notebook' : slug}.upwell.json`;
}

/**
 * Notebook files: a notebook written out with its bindings named, and a file
 * read back into a new notebook of a group whose series carry those names.
 * An import either creates the whole notebook or nothing.
 */
@Injectable()
export class NotebookFilesService {
  constructor(
    private readonly em: EntityManager,
    private readonly notebooks: NotebookPolicy,
    private readonly groups: GroupPolicy,
    private readonly documents: DocumentsService,
  ) {}

  async export(user: User, notebookId: string): Promise<ExportedNotebookFile> {
    const { notebook } = await this.notebooks.authorize(user, notebookId, 'read');
    const { json } = renderDocument(await this.documents.load(notebookId));
    const ids = boundIds(listRecipes(json));
    const taken = new Set<string>();
    const refs: RefTables = { series: new Map(), fields: new Map(), eventSets: new Map() };

    const series = await this.em.find(Series, { id: { $in: [...ids.series] }, group: notebook.group }, { orderBy: { name: 'asc' } });
    const fileSeries = series.map((s) => {
      const ref = refFromName(s.name, taken);
      refs.series.set(s.id, ref);
      return { ref, name: s.name, kind: s.kind, units: s.units, origin: s.origin };
    });
    const fields = await this.em.find(ZonalMeanField, { id: { $in: [...ids.fields] }, group: notebook.group }, { orderBy: { name: 'asc' } });
    const fileFields = fields.map((f) => {
      const ref = refFromName(f.name, taken);
      refs.fields.set(f.id, ref);
      return { ref, name: f.name, units: f.units };
    });
    const sets = await this.em.find(EventSet, { id: { $in: [...ids.eventSets] }, notebook }, { orderBy: { name: 'asc' } });
    const fileSets = sets.map((s) => {
      const ref = refFromName(s.name, taken);
      refs.eventSets.set(s.id, ref);
      const derivedFrom = s.derivedFrom ? recipeToFile(s.derivedFrom, refs) : undefined;
      return { ref, name: s.name, ...(derivedFrom ? { derivedFrom } : {}), events: s.events.map((e) => ({ ...e })) };
    });
    // A binding to a series deleted since keeps its id as ref; the file then says plainly what is missing.
    for (const id of ids.series) {
      if (!refs.series.has(id)) fileSeries.push({ ref: refFromName(`missing-${id}`, taken), name: `missing series ${id}`, kind: 'other', units: '', origin: 'unspecified' });
    }
    const file: NotebookFile = {
      format: NOTEBOOK_FILE_FORMAT,
      formatVersion: NOTEBOOK_FILE_VERSION,
      title: notebook.title,
      description: notebook.description,
      exportedAt: new Date().toISOString(),
      editorSchemaVersion: EDITOR_SCHEMA_VERSION,
      document: mapRecipes(json, (r) => recipeToFile(r, refs), (k) => keyToFile(k, refs)) as NotebookFile['document'],
      series: fileSeries,
      fields: fileFields,
      eventSets: fileSets,
    };
    return { file, fileName: notebookFileName(notebook.title) };
  }

  async import(user: User, groupId: string, file: NotebookFile): Promise<NotebookView> {
    const membership = await this.groups.authorize(user, groupId, 'create-notebook');
    if (file.editorSchemaVersion > EDITOR_SCHEMA_VERSION) {
      throw refused(`this file was written by a newer Upwell (editor schema ${file.editorSchemaVersion}; this one reads up to ${EDITOR_SCHEMA_VERSION})`, [{ path: 'editorSchemaVersion', message: 'newer than this Upwell' }]);
    }
    const recipes = listRecipes(file.document);
    this.checkRefsDeclared(file, recipes);
    const ids = await this.resolve(groupId, file, recipes);
    const document = mapRecipes(file.document, (r) => recipeFromFile(r, ids), (k) => keyFromFile(k, ids));
    this.checkRecipes(document);
    const state = this.checkedState(document);

    const notebook = await this.em.transactional(async (em) => {
      const nb = em.create(Notebook, { group: membership.group, title: file.title, description: file.description, owner: user });
      em.create(NotebookRoleAssignment, { notebook: nb, user, role: 'lead-author' });
      em.create(NotebookDocument, { notebook: nb, state: Buffer.from(state) });
      for (const set of file.eventSets) {
        const derivedFrom = set.derivedFrom && typeof set.derivedFrom === 'object' ? recipeFromFile(set.derivedFrom as Record<string, unknown>, ids) : null;
        em.create(EventSet, { id: ids.eventSets.get(set.ref)!, notebook: nb, name: set.name, derivedFrom, events: set.events.map((e) => ({ ...e }) as StoredEvent), createdBy: user });
      }
      return nb;
    });
    return presentNotebook(notebook, 'lead-author');
  }

  /** Every ref a recipe uses must be declared in the file's lists. */
  private checkRefsDeclared(file: NotebookFile, recipes: Record<string, unknown>[]): void {
    const used = usedRefs(recipes);
    for (const key of listNumberKeys(file.document)) keyRefs(key).forEach((r) => used.series.add(r));
    const issues: InputIssue[] = [];
    const check = (kind: string, list: { ref: string }[], refs: Set<string>, path: string) => {
      const declared = new Set(list.map((x) => x.ref));
      for (const r of refs) if (!declared.has(r)) issues.push({ path, message: `the document uses ${kind} ref “${r}”, which ${path} does not declare` });
    };
    check('series', file.series, used.series, 'series');
    check('field', file.fields, used.fields, 'fields');
    check('event set', file.eventSets, used.eventSets, 'eventSets');
    if (issues.length) throw refused(issues.map((i) => i.message).join('; '), issues);
  }

  /**
   * Resolves each declared series and field by its exact name in the group,
   * and checks pinned versions exist; anything unresolved is listed by name.
   */
  private async resolve(groupId: string, file: NotebookFile, recipes: Record<string, unknown>[]): Promise<RefTables> {
    const issues: InputIssue[] = [];
    const ids: RefTables = { series: new Map(), fields: new Map(), eventSets: new Map() };
    const names = file.series.map((s) => s.name);
    const found = names.length ? await this.em.find(Series, { group: groupId, name: { $in: names } }) : [];
    file.series.forEach((s, i) => {
      const matches = found.filter((f) => f.name === s.name);
      if (matches.length === 1) ids.series.set(s.ref, matches[0].id);
      else if (matches.length === 0) issues.push({ path: `series.${i}.name`, message: `no series named “${s.name}” in this group` });
      else issues.push({ path: `series.${i}.name`, message: `${matches.length} series in this group are named “${s.name}”; rename all but one` });
    });
    const fieldNames = file.fields.map((f) => f.name);
    const zonal = fieldNames.length ? await this.em.find(ZonalMeanField, { group: groupId, name: { $in: fieldNames } }, { orderBy: { createdAt: 'desc' } }) : [];
    file.fields.forEach((f, i) => {
      // Zonal means are derived and re-made freely, so the newest of a name is the one meant.
      const match = zonal.find((z) => z.name === f.name);
      if (match) ids.fields.set(f.ref, match.id);
      else issues.push({ path: `fields.${i}.name`, message: `no zonal-mean field named “${f.name}” in this group` });
    });
    for (const set of file.eventSets) ids.eventSets.set(set.ref, randomUUID());
    if (!issues.length) issues.push(...(await this.missingVersions(file, recipes, ids)));
    if (issues.length) {
      const why = issues.map((i) => i.message).join('; ');
      throw refused(`the file’s data could not be matched in this group: ${why}. Upload or rename them (names must match exactly) and import again; nothing was created`, issues);
    }
    return ids;
  }

  /** Pinned version numbers that the resolved series do not have. */
  private async missingVersions(file: NotebookFile, recipes: Record<string, unknown>[], ids: RefTables): Promise<InputIssue[]> {
    const pinned = new Map<string, number>();
    const visit = (v: unknown): void => {
      if (Array.isArray(v)) return v.forEach(visit);
      if (!v || typeof v !== 'object') return;
      const o = v as Record<string, unknown>;
      if (typeof o.ref === 'string' && typeof o.version === 'number') pinned.set(`${o.ref}@${o.version}`, o.version);
      Object.values(o).forEach(visit);
    };
    recipes.forEach(visit);
    const issues: InputIssue[] = [];
    for (const [key, version] of pinned) {
      const ref = key.slice(0, key.lastIndexOf('@'));
      const seriesId = ids.series.get(ref)!;
      if (!(await this.em.count(SeriesVersion, { series: seriesId, number: version }))) {
        const name = file.series.find((s) => s.ref === ref)?.name ?? ref;
        issues.push({ path: 'document', message: `no version ${version} of “${name}” (a figure pins it)` });
      }
    }
    return issues;
  }

  /** Each figure's and live number's recipe must be one the engine computes. */
  private checkRecipes(document: DocJson): void {
    const issues: InputIssue[] = [];
    listRecipes(document).forEach((r, i) => {
      const parsed = figureRecipeSchema.safeParse(r);
      if (!parsed.success) {
        for (const issue of describeIssues(parsed.error).issues) issues.push({ path: `document.recipe[${i}]${issue.path ? '.' + issue.path : ''}`, message: issue.message });
      }
    });
    if (issues.length) throw refused(`the file holds recipes Upwell cannot compute: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues);
    // Captions are checked as an HTTP edit checks them (recipes were checked above, with file paths).
    const captions = liveNodeIssues(document as unknown as PmJson).filter((i) => i.path.endsWith('.caption'));
    if (captions.length) throw refused(`the file holds captions that are too long: ${captions.map((i) => `${i.path}: ${i.message}`).join('; ')}`, captions.map((i) => ({ path: `document.${i.path}`, message: i.message })));
  }

  /** The document as Yjs state, checked against the editor schema exactly as every edit is. */
  private checkedState(document: DocJson): Uint8Array {
    try {
      const state = stateFromJson(document);
      const doc = new Y.Doc();
      Y.applyUpdate(doc, state);
      renderDocument(doc);
      return state;
    } catch (err) {
      const why = err instanceof Error ? err.message : 'it could not be read';
      throw refused(`the document does not fit Upwell’s editor schema: ${why}`, [{ path: 'document', message: why }]);
    }
  }
}
