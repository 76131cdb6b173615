/**
 * Rewriting the recipes inside a document between stored ids (what a notebook
 * holds) and file refs (what a notebook file holds). Pure: the service looks
 * the names up, these functions only walk and replace.
 */

import { LIVE_NUMBER, mapLiveNodeAttrs, type PmJson } from '@upwell/common';

/** A document node as ProseMirror JSON. */
export type DocJson = Record<string, unknown>;

type Json = unknown;
type ObjectMapper = (obj: Record<string, unknown>) => Record<string, unknown>;

function isObject(v: Json): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Applies `map` to every object inside a recipe, deepest first. */
function mapObjects(value: Json, map: ObjectMapper): Json {
  if (Array.isArray(value)) return value.map((v) => mapObjects(v, map));
  if (!isObject(value)) return value;
  const inner = Object.fromEntries(Object.entries(value).map(([k, v]) => [k, mapObjects(v, map)]));
  return map(inner);
}

/**
 * A copy of the document with every recipe passed through `rewrite`, and
 * every live number's key through `rewriteKey` (event-table keys name a
 * series by its id, e.g. `strongest.<seriesId>.PgC`).
 */
export function mapRecipes(
  doc: DocJson,
  rewrite: (recipe: Record<string, unknown>) => Record<string, unknown>,
  rewriteKey: (key: string) => string = (k) => k,
): DocJson {
  return mapLiveNodeAttrs(doc as unknown as PmJson, (type, attrs) => {
    if (!isObject(attrs.recipe)) return attrs;
    const out: Record<string, unknown> = { ...attrs, recipe: rewrite(attrs.recipe) };
    if (type === LIVE_NUMBER && typeof attrs.key === 'string') out.key = rewriteKey(attrs.key);
    return out;
  }) as unknown as DocJson;
}

/** Every recipe in the document, in document order. */
export function listRecipes(doc: DocJson): Record<string, unknown>[] {
  const found: Record<string, unknown>[] = [];
  mapRecipes(doc, (r) => (found.push(r), r));
  return found;
}

/** Stored ids a set of recipes binds: series, zonal-mean fields and event sets. */
export interface BoundIds {
  series: Set<string>;
  fields: Set<string>;
  eventSets: Set<string>;
}

/** Collects the ids bound anywhere in the recipes. */
export function boundIds(recipes: Record<string, unknown>[]): BoundIds {
  const ids: BoundIds = { series: new Set(), fields: new Set(), eventSets: new Set() };
  for (const r of recipes) {
    mapObjects(r, (o) => {
      if (typeof o.seriesId === 'string') ids.series.add(o.seriesId);
      if (typeof o.zonalFieldId === 'string') ids.fields.add(o.zonalFieldId);
      if (o.from === 'event-set' && typeof o.eventSetId === 'string') ids.eventSets.add(o.eventSetId);
      return o;
    });
  }
  return ids;
}

/** Lookups from one side to the other (id → ref when exporting, ref → id when importing). */
export interface RefTables {
  series: Map<string, string>;
  fields: Map<string, string>;
  eventSets: Map<string, string>;
}

/** A recipe with stored ids replaced by file refs. */
export function recipeToFile(recipe: Record<string, unknown>, refs: RefTables): Record<string, unknown> {
  return mapObjects(recipe, (o) => {
    const { seriesId, zonalFieldId, eventSetId, ...rest } = o;
    if (typeof seriesId === 'string') return { ref: refs.series.get(seriesId) ?? seriesId, ...rest };
    if (typeof zonalFieldId === 'string') return { ...rest, zonalFieldRef: refs.fields.get(zonalFieldId) ?? zonalFieldId };
    if (o.from === 'event-set' && typeof eventSetId === 'string') return { ...rest, eventSetRef: refs.eventSets.get(eventSetId) ?? eventSetId };
    return o;
  }) as Record<string, unknown>;
}

/** Refs a file's recipes use, by what they point at (to check each is declared). */
export function usedRefs(recipes: Record<string, unknown>[]): { series: Set<string>; fields: Set<string>; eventSets: Set<string> } {
  const used = { series: new Set<string>(), fields: new Set<string>(), eventSets: new Set<string>() };
  for (const r of recipes) {
    mapObjects(r, (o) => {
      if (typeof o.ref === 'string') used.series.add(o.ref);
      if (typeof o.zonalFieldRef === 'string') used.fields.add(o.zonalFieldRef);
      if (typeof o.eventSetRef === 'string') used.eventSets.add(o.eventSetRef);
      return o;
    });
  }
  return used;
}

/** A file recipe with refs replaced by the stored ids they resolved to (every ref must be in `ids`). */
export function recipeFromFile(recipe: Record<string, unknown>, ids: RefTables): Record<string, unknown> {
  return mapObjects(recipe, (o) => {
    const { ref, zonalFieldRef, eventSetRef, ...rest } = o;
    if (typeof ref === 'string') return { seriesId: ids.series.get(ref), ...rest };
    if (typeof zonalFieldRef === 'string') return { ...rest, zonalFieldId: ids.fields.get(zonalFieldRef) };
    if (typeof eventSetRef === 'string') return { ...rest, eventSetId: ids.eventSets.get(eventSetRef) };
    return o;
  }) as Record<string, unknown>;
}

/** Every live number's key, in document order. */
export function listNumberKeys(doc: DocJson): string[] {
  const keys: string[] = [];
  mapRecipes(doc, (r) => r, (k) => (keys.push(k), k));
  return keys;
}

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;
const KEY_REF = /\{([A-Za-z0-9_.-]+)\}/g;

/** A live number's key with each bound series id written as `{ref}`. */
export function keyToFile(key: string, refs: RefTables): string {
  return key.replace(UUID, (id) => (refs.series.has(id) ? `{${refs.series.get(id)}}` : id));
}

/** Series refs a file's live-number key names as `{ref}`. */
export function keyRefs(key: string): string[] {
  return [...key.matchAll(KEY_REF)].map((m) => m[1]);
}

/** A file's live-number key with each `{ref}` replaced by the series id it resolved to. */
export function keyFromFile(key: string, ids: RefTables): string {
  return key.replace(KEY_REF, (whole, ref: string) => ids.series.get(ref) ?? whole);
}

/** A short readable ref from a name ("DIC inventory 0–100 m" → "dic-inventory-0-100-m"), unique among `taken`. */
export function refFromName(name: string, taken: Set<string>, maxLength = 32): string {
  const base =
    name
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, maxLength)
      .replace(/-+$/, '') || 'ref';
  let ref = base;
  for (let n = 2; taken.has(ref); n++) ref = `${base}-${n}`;
  taken.add(ref);
  return ref;
}
