import type { FigureKind, FigureResult } from '@upwell/common';
import { readFigureData } from '@upwell/common';

type Cell = string | number | null | undefined;

/** One CSV field, quoted when it holds a comma, quote or line break (RFC 4180). */
function field(v: Cell): string {
  if (v === null || v === undefined) return '';
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows to CSV text with CRLF line ends (RFC 4180). */
export function toCsv(header: string[], rows: Cell[][]): string {
  return [header, ...rows].map((r) => r.map(field).join(',')).join('\r\n') + '\r\n';
}

/** The figure's data flattened to one table: the header and rows for its kind. */
export function figureTable(kind: FigureKind, result: Pick<FigureResult, 'data' | 'used'>): { header: string[]; rows: Cell[][] } {
  switch (kind) {
    case 'timeseries': {
      const d = readFigureData('timeseries', result);
      const phaseOf = (m: string) => d.events.find((e) => e.start <= m && m <= e.end)?.phase ?? '';
      return { header: ['month', `value (${d.units})`, 'event'], rows: d.points.map((p) => [p.month, p.value, phaseOf(p.month)]) };
    }
    case 'seasonal-cycle': {
      const d = readFigureData('seasonal-cycle', result);
      return { header: ['month', `mean (${d.units})`, 'sd', 'min', 'max', 'n'], rows: d.months.map((m) => [m.month, m.mean, m.sd, m.min, m.max, m.n]) };
    }
    case 'lag-correlation': {
      const d = readFigureData('lag-correlation', result);
      return { header: ['lag', 'r', 'n', 'n_eff', 'p', 'threshold'], rows: d.lags.map((l) => [l.lag, l.r, l.n, l.nEff, l.p, l.threshold]) };
    }
    case 'composite': {
      const d = readFigureData('composite', result);
      return {
        header: ['offset', `mean (${d.units})`, 'lower', 'upper', 'n', ...d.members.map((m) => `event peaking ${m.at}`)],
        rows: d.offsets.map((o, i) => [o, d.mean[i], d.lower[i], d.upper[i], d.n[i], ...d.members.map((m) => m.values[i])]),
      };
    }
    case 'event-table': {
      const d = readFigureData('event-table', result);
      const carbon = d.events[0]?.carbon.map((c) => `${c.name} (Pg C)`) ?? [];
      return {
        header: ['phase', 'start', 'peak', 'end', 'months', 'peak value', 'strength', ...carbon],
        rows: d.events.map((e) => [e.phase, e.start, e.peak, e.end, e.months, e.peakValue, e.strength, ...e.carbon.map((c) => c.PgC)]),
      };
    }
    case 'budget': {
      const d = readFigureData('budget', result);
      return {
        header: ['month', ...d.terms.map((t) => `${t.name} (${d.units})`), 'tendency', 'residual'],
        rows: d.months.map((m, i) => [m, ...d.terms.map((t) => t.values[i]), d.tendency[i], d.residual[i]]),
      };
    }
    case 'hovmoller': {
      const d = readFigureData('hovmoller', result);
      return { header: ['month', 'latitude', `value (${d.units})`], rows: d.cells.map((c) => [c.month, c.lat, c.value]) };
    }
    case 'scatter': {
      const d = readFigureData('scatter', result);
      return { header: ['month', `x (${d.xUnits})`, `y (${d.yUnits})`], rows: d.points.map((p) => [p.month, p.x, p.y]) };
    }
  }
}

/** The figure's data as CSV text. */
export function figureCsv(kind: FigureKind, result: Pick<FigureResult, 'data' | 'used'>): string {
  const { header, rows } = figureTable(kind, result);
  return toCsv(header, rows);
}
