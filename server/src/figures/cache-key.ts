import { createHash } from 'node:crypto';
import { ENGINE_VERSION, type ParsedFigureRecipe } from '@upwell/common';

/** JSON with object keys sorted at every level, so equal values always give equal text. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const obj = value as Record<string, unknown>;
  const keys = Object.keys(obj).filter((k) => obj[k] !== undefined).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(obj[k])}`).join(',')}}`;
}

/** What a figure's answer depends on, besides the recipe. */
export interface CacheKeyParts {
  recipe: ParsedFigureRecipe;
  /** Each bound series at its path, resolved to a version number and the hash of its values. */
  series: { path: string; seriesId: string; version: number; valuesSha256: string }[];
  eventSet: { id: string; updatedAt: string; eventsSha256: string } | null;
  zonalField: { id: string; months: number; latitudes: number } | null;
}

/**
 * sha256 of the canonical parsed recipe (defaults applied, so a spelled-out default and an
 * omitted one share a key), each bound series' id, resolved version and values hash, the event
 * set's edit time and content hash when one is used, the zonal field's id, and ENGINE_VERSION.
 * "latest" is in the recipe but the resolved number is in the key, so a new version misses.
 */
export function figureCacheKey(parts: CacheKeyParts): string {
  return createHash('sha256').update(canonicalJson({ ...parts, engineVersion: ENGINE_VERSION })).digest('hex');
}

/** sha256 of any JSON value in canonical form (an event set's events). */
export function contentSha256(value: unknown): string {
  return createHash('sha256').update(canonicalJson(value)).digest('hex');
}
