import { figureTable, type FigureResult, type TableCell as Cell } from '@upwell/common';

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

/** The figure's data as CSV text: its kind's table (common/src/figure-kinds/<kind>). */
export function figureCsv(result: Pick<FigureResult, 'kind' | 'data'>): string {
  const { header, rows } = figureTable(result);
  return toCsv(header, rows);
}
