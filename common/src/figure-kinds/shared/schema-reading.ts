/**
 * Reading defaults and bounds back out of zod schemas, so forms show the same defaults and
 * limits the server applies without restating them.
 */
import type { z } from 'zod';

type Def = { type: string; innerType?: z.ZodType; in?: z.ZodType; shape?: Record<string, z.ZodType>; options?: z.ZodType[] };
const defOf = (s: z.ZodType) => (s as unknown as { _zod: { def: Def } })._zod.def;

/** The schema under default/prefault/optional/nullable/pipe wrappers. */
export function unwrapSchema(schema: z.ZodType): z.ZodType {
  let s = schema;
  for (;;) {
    const d = defOf(s);
    if (d.innerType && ['default', 'prefault', 'optional', 'nullable', 'readonly', 'catch'].includes(d.type)) s = d.innerType;
    else if (d.type === 'pipe' && d.in) s = d.in;
    else return s;
  }
}

/** The field schema at a path of object keys ("anomaly", "smooth"), or undefined. */
export function fieldSchema(schema: z.ZodType, path: readonly string[]): z.ZodType | undefined {
  let s: z.ZodType | undefined = schema;
  for (const key of path) {
    if (!s) return undefined;
    const d = defOf(unwrapSchema(s));
    // A union (the event source): the first member that has the key.
    const members = d.type === 'union' && d.options ? d.options.map((o) => defOf(unwrapSchema(o))) : [d];
    s = members.find((m) => m.shape && key in m.shape)?.shape?.[key];
  }
  return s;
}

/** Bounds of a number field as its checks state them (exclusive bounds come back as the bound itself). */
export function numberBounds(schema: z.ZodType, path: readonly string[] = []): { min?: number; max?: number } {
  const field = fieldSchema(schema, path);
  if (!field) return {};
  const n = unwrapSchema(field) as unknown as { minValue?: number | null; maxValue?: number | null };
  const finite = (v: number | null | undefined) => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
  return { min: finite(n.minValue), max: finite(n.maxValue) };
}

/** Most items of an array field (its .max check). */
export function arrayMax(schema: z.ZodType, path: readonly string[]): number | undefined {
  const field = fieldSchema(schema, path);
  if (!field) return undefined;
  const checks = (unwrapSchema(field) as unknown as { _zod: { def: { checks?: { _zod: { def: { check: string; maximum?: number } } }[] } } })._zod.def.checks ?? [];
  const max = checks.map((c) => c._zod.def).find((d) => d.check === 'max_length');
  return max?.maximum;
}

/**
 * A whole value of an object schema: each field the skeleton gives, else the field's own
 * default (`schema.shape[key].parse(undefined)`); fields without a default stay out. The
 * skeleton holds only what the schema cannot default (e.g. an empty series binding).
 */
export function defaultsOf(schema: z.ZodObject, skeleton: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(schema.shape as Record<string, z.ZodType>)) {
    if (key in skeleton) {
      out[key] = structuredClone(skeleton[key]);
      continue;
    }
    const parsed = field.safeParse(undefined);
    if (parsed.success && parsed.data !== undefined) out[key] = parsed.data;
  }
  return out;
}
