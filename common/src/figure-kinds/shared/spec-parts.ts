import { formatMonth, parseMonth } from '../../series/month';
import type { FigureEvent } from './result-parts';

/** What to call an axis when the server gave no units: say so rather than print a bare number. */
export const NO_UNITS = 'units not given';

/** The months of an event a chart shades. */
export type EventSpan = Pick<FigureEvent, 'phase' | 'start' | 'peak' | 'end'>;

/** vega-lite schema of every spec. */
export const SCHEMA = 'https://vega.github.io/schema/vega-lite/v6.json';

/** Ends of vega's colour-blind-safe `redblue` scheme: warm events red, cold events blue. */
export const WARM = '#b2182b';
export const COLD = '#2166ac';
/** The line colour of a plotted series (ink; shading carries the hue). */
export const INK = '#1d2326';
export const ACCENT = '#0f5e5c';
export const MUTED = '#8a8f92';

/** Shared look: journal-sized axis type, no frame, legend at the bottom so it prints. */
export const BASE_CONFIG = {
  font: 'Source Sans 3',
  axis: { labelFontSize: 11, titleFontSize: 12, titleFontWeight: 600, gridColor: '#ece8de' },
  legend: { orient: 'bottom', labelFontSize: 11, titleFontSize: 11 },
  title: { fontSize: 13, font: 'Merriweather', fontWeight: 400, anchor: 'start' },
  view: { stroke: null },
} as const;

/** "Value (Pg C)", or says the units are missing rather than printing a bare axis. */
export function axisTitle(label: string, units: string | undefined): string {
  return `${label} (${units && units.trim() ? units.trim() : NO_UNITS})`;
}

/** "YYYY-MM" → the first day of that month, a date vega reads the same in every browser. */
export function monthStart(month: string): string {
  return `${month}-01`;
}

/** The first day of the month after "YYYY-MM" (so a shaded event covers its last month). */
export function monthAfter(month: string): string {
  return `${formatMonth(parseMonth(month) + 1)}-01`;
}

/** Records of events for shading. */
export function eventRecords(events: EventSpan[]) {
  return events.map((e) => ({
    phase: e.phase,
    label: e.phase === 'warm' ? 'warm' : 'cold',
    start: monthStart(e.start),
    end: monthAfter(e.end),
    peak: monthStart(e.peak),
  }));
}

/** The colour scale of event phases, with a legend naming them (colour is never the only cue). */
export const PHASE_SCALE = { domain: ['warm', 'cold'], range: [WARM, COLD] };
export const PHASE_LEGEND = { title: 'Events', labelExpr: "datum.label === 'warm' ? 'warm event' : 'cold event'" };

/** Layers that shade warm and cold events behind a time axis and label each with its phase. */
export function eventLayers(events: EventSpan[]) {
  if (events.length === 0) return [];
  const values = eventRecords(events);
  return [
    {
      data: { values },
      mark: { type: 'rect', opacity: 0.16 },
      encoding: {
        x: { field: 'start', type: 'temporal' },
        x2: { field: 'end' },
        color: { field: 'phase', type: 'nominal', scale: PHASE_SCALE, legend: PHASE_LEGEND },
      },
    },
    {
      data: { values },
      mark: { type: 'text', baseline: 'top', dy: 2, fontSize: 9, fontWeight: 600 },
      encoding: {
        x: { field: 'peak', type: 'temporal' },
        y: { value: 0 },
        text: { field: 'label' },
        color: { field: 'phase', type: 'nominal', scale: PHASE_SCALE },
      },
    },
  ];
}
