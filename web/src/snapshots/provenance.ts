import type { UsedSeries } from '@upwell/common';

/** One line of a frozen figure's parameters: "anomaly base period" → "1991-01 to 2020-12". */
export interface ParameterLine {
  name: string;
  value: string;
}

/** The first characters of a sha256, enough to tell versions apart by eye (the full hash is in the HTML file). */
export function shaPrefix(sha256: string, length = 12): string {
  return sha256.slice(0, length);
}

const isBinding = (v: unknown): v is { seriesId: string; version: unknown } =>
  typeof v === 'object' && v !== null && 'seriesId' in v && typeof (v as { seriesId: unknown }).seriesId === 'string';

const isPeriod = (v: unknown): v is { from: string; to: string } =>
  typeof v === 'object' && v !== null && Object.keys(v).length === 2 && typeof (v as { from?: unknown }).from === 'string' && typeof (v as { to?: unknown }).to === 'string';

const isNamedTerm = (v: unknown): v is { name: string; series: { seriesId: string; version: unknown } } =>
  typeof v === 'object' && v !== null && typeof (v as { name?: unknown }).name === 'string' && isBinding((v as { series?: unknown }).series);

/** "maxLag" → "max lag", "eventSetId" → "event set id": recipe keys as words. */
function words(path: string[]): string {
  return path
    .map((p) => p.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase())
    .join(' ')
    .trim();
}

/**
 * A frozen recipe's parameters as lines to print under its figure. Series
 * bindings read as the series' name and the exact version used (the snapshot
 * resolved "latest"), base periods as "from to", other values as they are.
 */
export function recipeParameters(recipe: Record<string, unknown>, used: UsedSeries[]): ParameterLine[] {
  const lines: ParameterLine[] = [];
  const nameOf = (b: { seriesId: string; version: unknown }) => {
    const u = used.find((s) => s.seriesId === b.seriesId);
    const version = typeof b.version === 'number' ? b.version : u?.version;
    return `${u?.name ?? `series ${b.seriesId.slice(0, 8)}`}${version !== undefined ? ` v${version}` : ''}`;
  };
  const visit = (value: unknown, path: string[]) => {
    if (value === undefined || value === null) return;
    if (isBinding(value)) lines.push({ name: words(path), value: nameOf(value) });
    else if (isPeriod(value)) lines.push({ name: words(path), value: `${value.from} to ${value.to}` });
    else if (Array.isArray(value)) {
      if (value.length === 0) lines.push({ name: words(path), value: 'none' });
      else if (value.every(isBinding)) lines.push({ name: words(path), value: value.map(nameOf).join(', ') });
      else value.forEach((v, i) => visit(v, isNamedTerm(v) ? path : [...path, String(i + 1)]));
    } else if (typeof value === 'object') {
      const o = value as Record<string, unknown>;
      // A budget term: its own name is the label of its series.
      if (isNamedTerm(o)) lines.push({ name: `term “${o.name}”`, value: nameOf(o.series) });
      else for (const [k, v] of Object.entries(o)) visit(v, [...path, k]);
    } else if (typeof value === 'boolean') lines.push({ name: words(path), value: value ? 'yes' : 'no' });
    else lines.push({ name: words(path), value: String(value) });
  };
  for (const [k, v] of Object.entries(recipe)) if (k !== 'kind') visit(v, [k]);
  return lines;
}
