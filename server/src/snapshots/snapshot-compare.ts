import { canonicalJSON, type FigureChange, type FrozenFigure, type FrozenNumber, type NumberChange, type SnapshotComparison } from '@upwell/common';
import { diffWordsWithSpace } from 'diff';
import { textBlocksOf, type PmJson } from './document-walk';

/** One side of a comparison: a snapshot's frozen content or the live notebook computed now. */
export interface ComparedContent {
  document: PmJson;
  figures: FrozenFigure[];
  numbers: FrozenNumber[];
}

/** The document's text blocks joined by a blank line, live numbers as the text they showed. */
export function documentText(side: ComparedContent): string {
  return textBlocksOf(side.document, (i) => side.numbers[i]?.text ?? 'n/a').join('\n\n');
}

/** Word-level diff of two texts (whitespace kept as its own tokens), as equal/insert/delete runs. */
export function diffText(before: string, after: string): SnapshotComparison['text'] {
  return diffWordsWithSpace(before, after).map((c) => ({ op: c.added ? 'insert' : c.removed ? 'delete' : 'equal', text: c.value }));
}

/** A recipe without its versions: a newer version of the same data is not a change of recipe. */
function recipeShape(recipe: Record<string, unknown> | null): string {
  const strip = (v: unknown): unknown => {
    if (Array.isArray(v)) return v.map(strip);
    if (v && typeof v === 'object') {
      const o = v as Record<string, unknown>;
      return Object.fromEntries(Object.entries(o).filter(([k]) => !('seriesId' in o && k === 'version')).map(([k, x]) => [k, strip(x)]));
    }
    return v;
  };
  return canonicalJSON(strip(recipe));
}

/** Figures matched by figureId, in the order of the later side, then those only the earlier side has. */
export function compareFigures(before: FrozenFigure[], after: FrozenFigure[]): FigureChange[] {
  const earlier = new Map(before.map((f) => [f.figureId, f]));
  const later = new Map(after.map((f) => [f.figureId, f]));
  const ids = [...after.map((f) => f.figureId), ...before.map((f) => f.figureId).filter((id) => !later.has(id))];
  return ids.map((id) => {
    const b = earlier.get(id) ?? null;
    const a = later.get(id) ?? null;
    const keys = [...new Set([...(b?.result?.numbers ?? []), ...(a?.result?.numbers ?? [])].map((n) => n.key))];
    const values = keys.map((key) => {
      const nb = b?.result?.numbers.find((n) => n.key === key);
      const na = a?.result?.numbers.find((n) => n.key === key);
      const meta = na ?? nb!;
      return { key, label: meta.label, units: meta.units, before: nb?.value ?? null, after: na?.value ?? null };
    });
    const seriesBefore = b?.result?.used ?? [];
    const seriesAfter = a?.result?.used ?? [];
    const recipeChanged = !!a && !!b && recipeShape(a.recipe) !== recipeShape(b.recipe);
    const changed =
      recipeChanged ||
      b?.caption !== a?.caption ||
      b?.error !== a?.error ||
      canonicalJSON(seriesBefore) !== canonicalJSON(seriesAfter) ||
      values.some((v) => !Object.is(v.before, v.after));
    return {
      figureId: id,
      ordinalBefore: b?.ordinal ?? null,
      ordinalAfter: a?.ordinal ?? null,
      status: !b ? 'added' : !a ? 'removed' : changed ? 'changed' : 'unchanged',
      captionBefore: b?.caption ?? null,
      captionAfter: a?.caption ?? null,
      recipeChanged,
      seriesBefore,
      seriesAfter,
      values,
    };
  });
}

/** Live numbers matched by position where they are the same number, then by recipe and key. */
export function compareNumbers(before: FrozenNumber[], after: FrozenNumber[]): NumberChange[] {
  const same = (b: FrozenNumber, a: FrozenNumber) => b.key === a.key && recipeShape(b.recipe) === recipeShape(a.recipe);
  const pairOf = new Map<FrozenNumber, FrozenNumber>();
  const taken = new Set<FrozenNumber>();
  for (const a of after) {
    const b = before[a.ordinal - 1];
    if (b && same(b, a)) {
      pairOf.set(a, b);
      taken.add(b);
    }
  }
  for (const a of after) {
    if (pairOf.has(a)) continue;
    const b = before.find((x) => !taken.has(x) && same(x, a));
    if (b) {
      pairOf.set(a, b);
      taken.add(b);
    }
  }
  const row = (b: FrozenNumber | null, a: FrozenNumber | null): NumberChange => ({
    ordinalBefore: b?.ordinal ?? null,
    ordinalAfter: a?.ordinal ?? null,
    key: (a ?? b)!.key,
    status: !b ? 'added' : !a ? 'removed' : b.text !== a.text || !Object.is(b.value, a.value) ? 'changed' : 'unchanged',
    textBefore: b?.text ?? null,
    textAfter: a?.text ?? null,
    before: b?.value ?? null,
    after: a?.value ?? null,
    units: a?.units ?? b?.units ?? null,
  });
  return [...after.map((a) => row(pairOf.get(a) ?? null, a)), ...before.filter((b) => !taken.has(b)).map((b) => row(b, null))];
}
