import { z } from 'zod';
import { plainText } from './text';
import { yearMonthSchema as monthSchema } from './analysis';
import {
  anomalyOptionsSchema,
  eventRuleSchema,
  eventSourceSchema,
  FIGURE_LIMITS,
  figureRecipeSchema,
  phaseSchema,
  seriesBindingSchema,
  type FigureEvent,
  type UsedSeries,
} from '../figure-kinds';

// The recipe and result schemas of every figure kind live in figure-kinds/ (one folder per kind,
// listed in its registry); this file holds the routes' bodies around them.

const binding = seriesBindingSchema;
const phase = phaseSchema;

/** Body of POST /api/notebooks/:notebookId/figures: compute one recipe over the notebook group's series. */
export const computeFigureRequestSchema = z.strictObject({ recipe: figureRecipeSchema });
export type ComputeFigureRequest = z.input<typeof computeFigureRequestSchema>;

/** One event in a saved event set. */
export const eventSetEntrySchema = z.strictObject({
  phase: phase,
  start: monthSchema,
  peak: monthSchema,
  end: monthSchema,
  label: plainText({ what: 'label' }).trim().max(FIGURE_LIMITS.eventLabelMax).default(''),
}).refine((e) => e.start <= e.peak && e.peak <= e.end, 'an event’s peak must lie between its start and end');

/** Body of POST/PUT event sets of a notebook. */
export const saveEventSetRequestSchema = z.strictObject({
  name: plainText({ what: 'name' }).trim().min(1).max(120),
  /** Where the events first came from (index and rule), kept as provenance. */
  derivedFrom: z.strictObject({ index: binding, rule: eventSourceSchema }).optional(),
  events: z.array(eventSetEntrySchema).max(FIGURE_LIMITS.maxEventsInSet),
});
export type SaveEventSetRequest = z.input<typeof saveEventSetRequestSchema>;

/** An event set as the API shows it. */
export const eventSetSchema = z.object({
  id: z.string(),
  notebookId: z.string(),
  name: z.string(),
  derivedFrom: z.unknown().nullable(),
  events: z.array(z.object({ phase, start: z.string(), peak: z.string(), end: z.string(), label: z.string() })),
  updatedAt: z.string(),
});
export type EventSetView = z.infer<typeof eventSetSchema>;

// ── Additions for the figure and event-set routes ────────────────────────────────────────

/**
 * Version of the engine's figure results. Part of every figure's cache key: bump it whenever a
 * change to the engine or to a recipe changes what a figure computes, so stored answers expire.
 */
export const ENGINE_VERSION = '1.0.0';

/**
 * Body of POST /api/notebooks/:notebookId/event-sets/detect: detect events in an index by the rule
 * without saving them, so the authors can edit them first. The index anomaly is made with
 * `anomaly` (base period, climatology, detrend, standardize); its `smooth` is replaced by the
 * rule's running mean, so the index is never smoothed twice.
 */
export const detectEventSetRequestSchema = z.strictObject({
  index: binding,
  rule: eventRuleSchema.prefault({ from: 'rule' }),
  anomaly: anomalyOptionsSchema.prefault({}),
});
export type DetectEventSetRequest = z.input<typeof detectEventSetRequestSchema>;

/** Answer of the detect route: the events, ready to edit and save as an event set. */
export interface DetectedEvents {
  index: UsedSeries;
  events: FigureEvent[];
  methods: string;
  warnings: string[];
}

