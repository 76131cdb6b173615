import { z } from 'zod';
import { plainText } from './text';
import { eventSetEntrySchema } from './figures';
import { LIMITS } from './limits';
import { DATA_ORIGINS, SERIES_KINDS, SERIES_LIMITS } from './series';

/**
 * Upwell's own notebook file (`*.upwell.json`): a notebook's document, the
 * recipes inside it, and the series, zonal-mean fields and event sets those
 * recipes bind, named rather than identified so the file can be imported into
 * any group that holds series of the same names. Described for people in
 * example-notebooks/README.md.
 */
export const NOTEBOOK_FILE_FORMAT = 'upwell-notebook';

/** The version of the file format this build writes and reads. */
export const NOTEBOOK_FILE_VERSION = 1;

/** File name ending of a notebook file. */
export const NOTEBOOK_FILE_EXTENSION = '.upwell.json';

/** Limits of a notebook file, so the import form and the server refuse the same file. */
export const NOTEBOOK_FILE_LIMITS = {
  maxRefs: 200,
  refMax: 40,
  maxEventSets: 50,
} as const;

const ref = plainText({ what: 'a ref', error: 'a ref must be text' })
  .trim()
  .min(1, 'a ref must not be empty')
  .max(NOTEBOOK_FILE_LIMITS.refMax)
  .regex(/^[A-Za-z0-9_.-]+$/, 'a ref is letters, digits, dot, dash or underscore');

/** A series the document binds, by name: resolved to a series of exactly this name in the importing group. */
export const notebookFileSeriesSchema = z.strictObject({
  ref,
  name: plainText({ what: 'a series name' }).trim().min(1, 'a series needs its name').max(SERIES_LIMITS.nameMax),
  kind: z.enum(SERIES_KINDS, { error: `kind must be one of ${SERIES_KINDS.join(', ')}` }),
  units: plainText({ what: 'units' }).max(SERIES_LIMITS.textMax).default(''),
  origin: z.enum(DATA_ORIGINS).optional(),
});
export type NotebookFileSeries = z.infer<typeof notebookFileSeriesSchema>;

/** A zonal-mean (time × latitude) field a time–latitude diagram binds, by name. */
export const notebookFileFieldSchema = z.strictObject({
  ref,
  name: plainText({ what: 'a field name' }).trim().min(1, 'a field needs its name').max(160),
  units: plainText({ what: 'units' }).max(SERIES_LIMITS.textMax).default(''),
});
export type NotebookFileField = z.infer<typeof notebookFileFieldSchema>;

/** A saved event set the document's recipes use; it is created anew in the imported notebook. */
export const notebookFileEventSetSchema = z.strictObject({
  ref,
  name: plainText({ what: 'an event set name' }).trim().min(1).max(120),
  derivedFrom: z.unknown().optional(),
  events: z.array(eventSetEntrySchema).max(200),
});
export type NotebookFileEventSet = z.infer<typeof notebookFileEventSetSchema>;

/** A ProseMirror node as JSON; the server checks it against the editor schema on import. */
const proseMirrorNode: z.ZodType<Record<string, unknown>> = z.looseObject({ type: z.string() });

/**
 * The notebook file. Inside `document`, every series binding of a figure or
 * live-number recipe is `{ ref, version }` (a ref into `series`) instead of
 * `{ seriesId, version }`; a time–latitude diagram has `zonalFieldRef` (into
 * `fields`) instead of `zonalFieldId`; a saved event set is
 * `{ from: 'event-set', eventSetRef }` (into `eventSets`).
 */
export const notebookFileSchema = z
  .strictObject({
    format: z.literal(NOTEBOOK_FILE_FORMAT, { error: `format must be "${NOTEBOOK_FILE_FORMAT}"` }),
    formatVersion: z.literal(NOTEBOOK_FILE_VERSION, { error: `formatVersion must be ${NOTEBOOK_FILE_VERSION}; this Upwell reads version ${NOTEBOOK_FILE_VERSION} files` }),
    title: plainText({ what: 'title' }).trim().min(1, 'title must not be empty').max(LIMITS.notebookTitleMax),
    description: plainText({ what: 'description', multiline: true }).trim().max(LIMITS.notebookDescriptionMax).default(''),
    exportedAt: z.iso.datetime({ error: 'exportedAt must be an ISO-8601 date-time' }),
    editorSchemaVersion: z.number().int().min(1),
    document: z.looseObject({ type: z.literal('doc', { error: 'document must be a ProseMirror document (type "doc")' }), content: z.array(proseMirrorNode).optional() }),
    series: z.array(notebookFileSeriesSchema).max(NOTEBOOK_FILE_LIMITS.maxRefs).default([]),
    fields: z.array(notebookFileFieldSchema).max(NOTEBOOK_FILE_LIMITS.maxRefs).default([]),
    eventSets: z.array(notebookFileEventSetSchema).max(NOTEBOOK_FILE_LIMITS.maxEventSets).default([]),
  })
  .superRefine((f, ctx) => {
    const seen = new Set<string>();
    for (const [list, items] of [['series', f.series], ['fields', f.fields], ['eventSets', f.eventSets]] as const) {
      items.forEach((item, i) => {
        if (seen.has(item.ref)) ctx.addIssue({ code: 'custom', path: [list, i, 'ref'], message: `ref "${item.ref}" is used twice` });
        seen.add(item.ref);
      });
    }
  });
export type NotebookFile = z.output<typeof notebookFileSchema>;
export type NotebookFileInput = z.input<typeof notebookFileSchema>;
