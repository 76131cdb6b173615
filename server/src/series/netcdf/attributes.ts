import type { NcAttributes } from './types';

/** A text attribute, trimmed; undefined when absent or not text. */
export function stringAttribute(attributes: NcAttributes, name: string): string | undefined {
  const v = attributes[name];
  return typeof v === 'string' ? v.trim() : undefined;
}

/** A numeric attribute's first value; undefined when absent or not numeric. */
export function numberAttribute(attributes: NcAttributes, name: string): number | undefined {
  const v = attributes[name];
  if (typeof v === 'number') return v;
  if (Array.isArray(v) && v.length > 0) return v[0];
  return undefined;
}

/** A numeric attribute as a list (one number becomes a list of one). */
export function numberListAttribute(attributes: NcAttributes, name: string): number[] | undefined {
  const v = attributes[name];
  if (typeof v === 'number') return [v];
  if (Array.isArray(v)) return v;
  return undefined;
}
