import { z } from 'zod';
import { plainText } from './text';
import { CF_CALENDAR_NAMES } from '../time/normalize-calendar';
import { SERIES_KINDS } from './series';

/**
 * Limits of the CSV import, shared by the upload form and the server so both refuse the same file or mapping.
 * Sizes are chosen for monthly series: 3,000 years of months is longer than any control run we expect.
 */
export const SERIES_IMPORT_LIMITS = {
  /** Largest upload, in bytes (decoded text of a string input is counted in UTF-16 code units). */
  maxUploadBytes: 32 * 1024 * 1024,
  /** Most columns in any line; a wider line is refused with its line number. */
  maxColumns: 1000,
  /** Most data rows in one file. */
  maxDataRows: 200_000,
  /** Longest series, in months, gaps included. */
  maxSeriesMonths: 12 * 3000,
  /** Parsed rows shown in the preview. */
  previewRows: 20,
  /** Lines read before deciding delimiter, header and layout. */
  sniffLines: 200,
  /** Warnings kept in one preview; later ones are summarised in one last warning. */
  maxWarnings: 50,
  maxMissingMarkers: 20,
  missingMarkerMax: 20,
  maxSentinels: 20,
  seriesNameMax: 120,
  variableMax: 80,
  unitsMax: 40,
  regionMax: 120,
  sourceMax: 300,
  notesMax: 2000,
  /** Deepest layer bound, in metres (deeper than the deepest trench). */
  depthMaxM: 11_000,
} as const;

/** Missing-value markers compared as text, case-insensitively, after trimming. */
export const DEFAULT_MISSING_MARKERS: readonly string[] = ['', 'NaN', 'NA', 'nan'];

/** Missing-value sentinels common in published index tables, compared as numbers (so -999.0 matches -999). */
export const DEFAULT_MISSING_SENTINELS: readonly number[] = [-99.9, -99.99, -999, -9999];

/** The `column` of the single series a wide (year × 12 months) table yields. */
export const WIDE_LAYOUT_COLUMN = '(months)';


/** Field separators the import understands; `whitespace` means runs of spaces or tabs (aligned tables). */
export const CSV_DELIMITERS = ['comma', 'semicolon', 'tab', 'whitespace'] as const;
export type CsvDelimiter = (typeof CSV_DELIMITERS)[number];

/** Decimal separator of number cells; `comma` is accepted only when the field separator is not a comma. */
export const CSV_DECIMAL_SEPARATORS = ['point', 'comma'] as const;
export type CsvDecimalSeparator = (typeof CSV_DECIMAL_SEPARATORS)[number];

/** How the dates of a long table are written. */
export const CSV_DATE_FORMATS = ['iso', 'slash', 'decimal-year', 'year+month'] as const;
export type CsvDateFormat = (typeof CSV_DATE_FORMATS)[number];

const monthString = z.string().regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'a month is written YYYY-MM');

/** Where a problem or a warning sits in the file; line numbers count physical lines from 1. */
export const csvImportIssueSchema = z.object({
  code: z.string(),
  message: z.string(),
  line: z.number().int().positive().optional(),
  column: z.string().optional(),
});
export type CsvImportIssue = z.infer<typeof csvImportIssueSchema>;

/** The table's layout as detected (or as forced by the options). */
export const csvLayoutSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('long'),
    /** One date column, or the year and month columns for `year+month`. */
    dateColumns: z.array(z.string()).min(1).max(2),
    dateFormat: z.enum(CSV_DATE_FORMATS),
  }),
  z.object({ kind: z.literal('wide'), yearColumn: z.string(), monthColumns: z.array(z.string()).length(12) }),
]);
export type CsvLayout = z.infer<typeof csvLayoutSchema>;

/** One series the file offers, before the researcher maps it. */
export const csvSeriesCandidateSchema = z.object({
  column: z.string(),
  start: monthString,
  values: z.array(z.number().nullable()),
  missingCount: z.number().int().nonnegative(),
  suggestedName: z.string(),
  suggestedUnits: z.string().optional(),
});
export type CsvSeriesCandidate = z.infer<typeof csvSeriesCandidateSchema>;

/** Answer of the CSV upload: what was read, shown to the researcher before anything is saved. */
export const csvImportPreviewSchema = z.object({
  delimiter: z.enum(CSV_DELIMITERS),
  decimalSeparator: z.enum(CSV_DECIMAL_SEPARATORS),
  encoding: z.enum(['utf-8', 'windows-1252']),
  /** Column names; generated as `column N` when the file has no header row. */
  header: z.array(z.string()),
  /** Line of the header row, or null when the file has none. */
  headerLine: z.number().int().positive().nullable(),
  /** Comment, title and blank lines skipped before the header (or the first data row). */
  linesBeforeHeader: z.number().int().nonnegative(),
  layout: csvLayoutSchema,
  /** The first data rows as text, cells trimmed. */
  rows: z.array(z.array(z.string())).max(SERIES_IMPORT_LIMITS.previewRows),
  rowCount: z.number().int().nonnegative(),
  series: z.array(csvSeriesCandidateSchema).min(1),
  warnings: z.array(csvImportIssueSchema),
});
export type CsvImportPreview = z.infer<typeof csvImportPreviewSchema>;

/** Answer when a file cannot be imported: one error, naming the line and column where it can. */
export const csvImportErrorSchema = csvImportIssueSchema;
export type CsvImportErrorView = z.infer<typeof csvImportErrorSchema>;

/** A describing field of a mapped column: the shared text rule (one line unless `singleLine: false`), trimmed and sized. */
function field(label: string, max: number, opts: { min?: number; singleLine?: boolean } = {}) {
  const base = plainText({ what: label, error: `${label} must be text`, multiline: opts.singleLine === false }).trim();
  return (opts.min ? base.min(opts.min, `${label} must not be empty`) : base).max(max, `${label} must be at most ${max} characters`);
}

/** Overrides of what the import detects, sent with the upload. */
export const csvImportOptionsSchema = z.strictObject({
  delimiter: z.enum(CSV_DELIMITERS).optional(),
  decimalSeparator: z.enum(CSV_DECIMAL_SEPARATORS).optional(),
  layout: z.enum(['long', 'wide']).optional(),
  hasHeader: z.boolean().optional(),
  /** Lines to skip before the header (or the first data row), instead of detecting them. */
  skipLines: z.number().int().nonnegative().max(10_000).optional(),
  /** Long layout: the date column, or the year and month columns. */
  dateColumns: z.array(plainText({ what: 'a date column' })).min(1).max(2).optional(),
  missingMarkers: z
    .array(plainText({ what: 'a missing-value marker' }).trim().max(SERIES_IMPORT_LIMITS.missingMarkerMax))
    .max(SERIES_IMPORT_LIMITS.maxMissingMarkers)
    .optional(),
  sentinels: z.array(z.number().finite()).max(SERIES_IMPORT_LIMITS.maxSentinels).optional(),
  /** CF calendar of the table's months (a model's noleap or 360_day run); default standard. */
  calendar: z.enum(CF_CALENDAR_NAMES).optional(),
});
export type CsvImportOptions = z.infer<typeof csvImportOptionsSchema>;

/** A layer of the water column in metres below the surface; a null bottom reaches the sea floor. */
export const depthLayerSchema = z
  .strictObject({
    topM: z.number().min(0).max(SERIES_IMPORT_LIMITS.depthMaxM),
    bottomM: z.number().min(0).max(SERIES_IMPORT_LIMITS.depthMaxM).nullable(),
  })
  .refine((d) => d.bottomM === null || d.bottomM > d.topM, 'the bottom of a depth layer must lie below its top');
export type DepthLayer = z.infer<typeof depthLayerSchema>;

const mappedColumn = z.strictObject({
  column: plainText({ what: 'column' }),
  skip: z.literal(false),
  name: field('name', SERIES_IMPORT_LIMITS.seriesNameMax, { min: 1 }),
  kind: z.enum(SERIES_KINDS, { error: `kind must be one of ${SERIES_KINDS.join(', ')}` }),
  variable: field('variable', SERIES_IMPORT_LIMITS.variableMax, { min: 1 }),
  /** Free text for now (e.g. `PgC`, `degC`); empty means dimensionless. */
  units: field('units', SERIES_IMPORT_LIMITS.unitsMax),
  region: field('region', SERIES_IMPORT_LIMITS.regionMax).default(''),
  depthLayer: depthLayerSchema.nullable().default(null),
  source: field('source', SERIES_IMPORT_LIMITS.sourceMax).default(''),
  notes: field('notes', SERIES_IMPORT_LIMITS.notesMax, { singleLine: false }).default(''),
});
const skippedColumn = z.strictObject({ column: plainText({ what: 'column' }), skip: z.literal(true) });

/** What to do with one candidate column: import it described so, or skip it. */
export const columnMappingSchema = z.discriminatedUnion('skip', [mappedColumn, skippedColumn]);
export type ColumnMapping = z.infer<typeof columnMappingSchema>;
export type MappedColumn = z.infer<typeof mappedColumn>;

/** Body the client sends back after the preview: one entry per column it decided on; unlisted columns are skipped. */
export const seriesImportMappingSchema = z
  .strictObject({ columns: z.array(columnMappingSchema).min(1).max(SERIES_IMPORT_LIMITS.maxColumns) })
  .superRefine((m, ctx) => {
    const seen = new Set<string>();
    const names = new Set<string>();
    m.columns.forEach((c, i) => {
      if (seen.has(c.column)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'column'], message: `column '${c.column}' is mapped twice` });
      seen.add(c.column);
      if (c.skip) return;
      const key = c.name.toLowerCase();
      if (names.has(key)) ctx.addIssue({ code: 'custom', path: ['columns', i, 'name'], message: `two series are named '${c.name}'` });
      names.add(key);
    });
    if (m.columns.every((c) => c.skip)) ctx.addIssue({ code: 'custom', path: ['columns'], message: 'every column is skipped; choose at least one to import' });
  });
export type SeriesImportMapping = z.infer<typeof seriesImportMappingSchema>;
/** The mapping as the client writes it (defaults not yet applied). */
export type SeriesImportMappingInput = z.input<typeof seriesImportMappingSchema>;

/** A series ready to store: the values of one column with the researcher's description. */
export const importedSeriesSchema = z.object({
  column: z.string(),
  name: z.string(),
  kind: z.enum(SERIES_KINDS),
  variable: z.string(),
  units: z.string(),
  region: z.string(),
  depthLayer: depthLayerSchema.nullable(),
  source: z.string(),
  notes: z.string(),
  start: monthString,
  values: z.array(z.number().nullable()),
  missingCount: z.number().int().nonnegative(),
});
export type ImportedSeries = z.infer<typeof importedSeriesSchema>;
