import { MINUS, type UsedSeries } from '@upwell/common';

const plain = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 });

/** A compared value: four significant digits, true minus sign, units after a space; "—" when there is none. */
export function formatCompared(value: number | null, units?: string | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  const text = plain.format(Math.abs(value));
  const signed = value < 0 && /[1-9]/.test(text) ? `${MINUS}${text}` : text;
  return units?.trim() ? `${signed}\u00a0${units.trim()}` : signed;
}

/** The change from one value to the next, signed ("+0.12 Pg C", "−3", "no change"), or "—" when either side is missing. */
export function formatChange(before: number | null, after: number | null, units?: string | null): string {
  if (before === null || after === null || !Number.isFinite(before) || !Number.isFinite(after)) return '—';
  const d = after - before;
  if (d === 0) return 'no change';
  const text = formatCompared(d, units);
  return d > 0 ? `+${text}` : text;
}

/** Words for each change status (the tables show these, not colours). */
export const STATUS_WORDS = { added: 'Added', removed: 'Removed', changed: 'Changed', unchanged: 'Unchanged' } as const;

/** "Figure 2", "Figure 3 (was Figure 2)", "Figure 1 (removed)": a figure's name on both sides. */
export function comparedName(noun: string, before: number | null, after: number | null): string {
  if (after !== null && before !== null) return before === after ? `${noun} ${after}` : `${noun} ${after} (was ${noun} ${before})`;
  if (after !== null) return `${noun} ${after} (new)`;
  return `${noun} ${before ?? '?'} (removed)`;
}

/** "DIC 0–100 m v3, Warm-pool index v5" for one side of a comparison. */
export function seriesLine(used: UsedSeries[]): string {
  return used.length === 0 ? 'none' : used.map((u) => `${u.name} v${u.version}`).join(', ');
}

/** One paragraph of the text diff: runs of equal, inserted and deleted words. */
export type DiffRun = { op: 'equal' | 'insert' | 'delete'; text: string };

/** Splits the server's word-level diff into paragraphs at its "\n\n" block separators. */
export function diffParagraphs(ops: DiffRun[]): DiffRun[][] {
  const blocks: DiffRun[][] = [[]];
  for (const op of ops) {
    op.text.split('\n\n').forEach((part, i) => {
      if (i > 0) blocks.push([]);
      if (part) blocks[blocks.length - 1].push({ op: op.op, text: part });
    });
  }
  return blocks.filter((b) => b.some((r) => r.text.trim() !== ''));
}
