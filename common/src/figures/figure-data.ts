import type {
  BudgetData as ServerBudgetData,
  CompositeData as ServerCompositeData,
  EventTableData as ServerEventTableData,
  FigureKind,
  FigureResult,
  UsedSeries,
} from '../api/figures';

/**
 * Plot-ready data of each recipe kind, as the figures' spec builders (web and server) read it from the figure
 * route to send it in `FigureResult.data`. Months are "YYYY-MM"; a missing
 * value is null. This file is the one place to adapt when the server's
 * shapes are settled.
 */
export type Phase = 'warm' | 'cold';

/** One detected or saved event. */
export interface EventSpan {
  phase: Phase;
  start: string;
  peak: string;
  end: string;
}

export interface TimeseriesPlotData {
  points: { month: string; value: number | null }[];
  events: EventSpan[];
  units: string;
  show: 'raw' | 'anomaly';
  /** Name of the plotted series, for the axis title. */
  name?: string;
}

export interface SeasonalCyclePlotData {
  months: { month: number; mean: number | null; sd: number | null; min: number | null; max: number | null; n: number }[];
  units: string;
  name?: string;
}

export interface LagCorrelationPlotData {
  /** Positive lag: the index leads the series by that many months. */
  lags: { lag: number; r: number | null; n: number; nEff: number | null; p: number | null; threshold: number | null }[];
  strongest: { lag: number; r: number; p: number | null } | null;
  method?: 'pearson' | 'spearman';
}

export interface CompositePlotData {
  /** Months from the event peak, one per position of mean/lower/upper/n. */
  offsets: number[];
  mean: (number | null)[];
  lower: (number | null)[];
  upper: (number | null)[];
  n: number[];
  /** One member per event: its peak month and its values at each offset. */
  members: { at: string; values: (number | null)[] }[];
  units: string;
  phase?: Phase;
}

export interface EventTablePlotData {
  events: (EventSpan & {
    months: number;
    peakValue: number | null;
    strength: string;
    carbon: { seriesId: string; name: string; PgC: number | null }[];
  })[];
  indexUnits?: string;
}

export interface BudgetPlotData {
  months: string[];
  terms: { name: string; values: (number | null)[] }[];
  tendency: (number | null)[];
  residual: (number | null)[];
  rmsResidual: number | null;
  relativeResidual: number | null;
  units: string;
}

export interface HovmollerPlotData {
  cells: { month: string; lat: number; value: number | null }[];
  units: string;
}

export interface ScatterPlotData {
  points: { x: number | null; y: number | null; month: string }[];
  fit: { slope: number; intercept: number; r2: number; n: number } | null;
  xUnits: string;
  yUnits: string;
  xName?: string;
  yName?: string;
}

/** Data type of each kind. */
export interface FigureDataByKind {
  timeseries: TimeseriesPlotData;
  'seasonal-cycle': SeasonalCyclePlotData;
  'lag-correlation': LagCorrelationPlotData;
  composite: CompositePlotData;
  'event-table': EventTablePlotData;
  budget: BudgetPlotData;
  hovmoller: HovmollerPlotData;
  scatter: ScatterPlotData;
}

/** What to call an axis when the server gave no units: say so rather than print a bare number. */
export const NO_UNITS = 'units not given';

/**
 * Reads a result's data as the kind's interface, filling units the data
 * leave out from the versions used (first bound series = y, index = x), so
 * every axis carries units.
 */
export function readFigureData<K extends FigureKind>(kind: K, result: Pick<FigureResult, 'data' | 'used'>): FigureDataByKind[K] {
  const d = { ...fromServerShape(kind, result.data as Record<string, unknown>) };
  const used: UsedSeries[] = result.used ?? [];
  const unitsOf = (i: number) => used[i]?.units || '';
  if (kind === 'scatter') {
    // The index is bound first, the series second.
    if (!d.xUnits) d.xUnits = unitsOf(0);
    if (!d.yUnits) d.yUnits = unitsOf(1) || unitsOf(0);
    if (!d.xName) d.xName = used[0]?.name;
    if (!d.yName) d.yName = used[1]?.name;
  } else if (kind === 'lag-correlation' || kind === 'composite') {
    if (!d.units) d.units = unitsOf(1) || unitsOf(0);
  } else if (!d.units) {
    d.units = unitsOf(0);
  }
  return d as unknown as FigureDataByKind[K];
}

/**
 * The server sends composite, event-table and budget data as records (one per
 * offset, event or month and term); the spec builders here take columns.
 * Other kinds arrive in the shape the specs read.
 */
function fromServerShape(kind: FigureKind, data: Record<string, unknown>): Record<string, unknown> {
  if (kind === 'composite' && Array.isArray(data.offsets) && typeof data.offsets[0] === 'object') {
    const c = data as unknown as ServerCompositeData;
    const atOf = (event: string) => c.events.find((e) => e.peak === event || e.start === event)?.peak ?? event;
    const byMember = new Map<string, Map<number, number | null>>();
    for (const m of c.members) {
      if (!byMember.has(m.event)) byMember.set(m.event, new Map());
      byMember.get(m.event)!.set(m.offset, m.value);
    }
    const offsets = c.offsets.map((o) => o.offset);
    return {
      offsets,
      mean: c.offsets.map((o) => o.mean),
      lower: c.offsets.map((o) => o.lower),
      upper: c.offsets.map((o) => o.upper),
      n: c.offsets.map((o) => o.n),
      members: [...byMember].map(([event, values]) => ({ at: atOf(event), values: offsets.map((o) => values.get(o) ?? null) })),
      units: c.units,
      phase: c.phase,
    };
  }
  if (kind === 'event-table' && Array.isArray(data.rows)) {
    const t = data as unknown as ServerEventTableData;
    return {
      events: t.rows.map((r) => ({
        phase: r.phase,
        start: r.start,
        peak: r.peak,
        end: r.end,
        months: r.months,
        peakValue: r.peakValue,
        strength: r.strength ?? '',
        carbon: t.carbonSeries.map((c) => ({ seriesId: c.seriesId, name: c.name, PgC: r.carbon[c.seriesId] ?? null })),
      })),
    };
  }
  if (kind === 'budget' && Array.isArray(data.termNames)) {
    const b = data as unknown as ServerBudgetData;
    const months = b.months.map((m) => m.month);
    const index = new Map(months.map((m, i) => [m, i]));
    const terms = b.termNames.map((name) => {
      const values: (number | null)[] = months.map(() => null);
      for (const t of b.terms) if (t.term === name) values[index.get(t.month)!] = t.value;
      return { name, values };
    });
    return {
      months,
      terms,
      tendency: b.months.map((m) => m.tendency),
      residual: b.months.map((m) => m.residual),
      rmsResidual: b.rmsResidual,
      relativeResidual: b.relativeResidual,
      units: b.units,
    };
  }
  return data;
}
