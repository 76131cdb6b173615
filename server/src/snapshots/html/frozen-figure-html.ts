import { canonicalJSON, FIGURE_KIND_LABELS, FIGURE_REGISTRY, figureData, formatValue, type EventTableData, type FrozenFigure } from '@upwell/common';
import { escapeHtml } from '../../common/escape-html';
import { figureSvg } from './figure-svg';

/** How much of a values hash is shown: enough to tell versions apart at a glance. */
const SHA_PREFIX = 12;

/** The event table as a plain HTML table (it is a table in the editor too). */
function eventTableHtml(data: EventTableData): string {
  if (data.rows.length === 0) return '<p>No events met the rule in this period.</p>';
  const carbon = data.carbonSeries;
  const cell = (v: number | null | undefined, p: number) => (v === null || v === undefined ? '—' : escapeHtml(formatValue(v, p)));
  const head = ['Phase', 'Start', 'Peak', 'End', 'Months', 'Peak value', 'Strength', ...carbon.map((c) => `${c.name} (Pg C)`)];
  const rows = data.rows.map((e) =>
    [e.phase, e.start, e.peak, e.end, String(e.months)].map((v) => `<td>${escapeHtml(v)}</td>`).join('') +
    `<td>${cell(e.peakValue, 2)}</td><td>${escapeHtml(e.strength ?? '')}</td>` +
    carbon.map((c) => `<td>${cell(e.carbon[c.seriesId], 3)}</td>`).join(''),
  );
  return `<table><thead><tr>${head.map((h) => `<th>${escapeHtml(h)}</th>`).join('')}</tr></thead><tbody>${rows.map((r) => `<tr>${r}</tr>`).join('')}</tbody></table>`;
}

/** The recipe's settings other than which series it binds (those are listed with their versions). */
function parametersOf(recipe: Record<string, unknown>): string {
  const rest = Object.entries(recipe).filter(([, v]) => !(v && typeof v === 'object' && 'seriesId' in (v as object)));
  return canonicalJSON(Object.fromEntries(rest));
}

/**
 * A frozen figure as it reads in the file: the picture (SVG as a data: URI, or the event table),
 * "Figure N." with its caption, the methods sentence and cautions, and where it came from.
 */
export async function frozenFigureHtml(figure: FrozenFigure): Promise<string> {
  const label = `Figure ${figure.ordinal}.`;
  const caption = figure.caption.trim();
  if (!figure.result || !figure.recipe) {
    return `<figure class="live-figure"><p class="figure-error">This figure could not be computed when the snapshot was published: ${escapeHtml(figure.error ?? 'unknown reason')}</p><figcaption><strong>${label}</strong> ${escapeHtml(caption)}</figcaption></figure>`;
  }
  const r = figure.result;
  const kind = FIGURE_REGISTRY.has(r.kind) ? FIGURE_KIND_LABELS[r.kind] : r.kind;
  let picture: string;
  if (r.kind === 'event-table') {
    picture = eventTableHtml(figureData('event-table', r));
  } else {
    const svg = await figureSvg(r);
    picture = svg
      ? `<img src="data:image/svg+xml;base64,${Buffer.from(svg, 'utf8').toString('base64')}" alt="${escapeHtml(`${label} ${kind}${caption ? `: ${caption}` : ''}`)}">`
      : '';
  }
  const cautions = r.cautions.length ? `<p class="cautions">${r.cautions.map(escapeHtml).join(' ')}</p>` : '';
  const provenance = [
    ...r.used.map((u) => `<li>${escapeHtml(u.name)} v${u.version}, sha256 ${escapeHtml(u.valuesSha256.slice(0, SHA_PREFIX))}…, ${escapeHtml(u.units || 'no units')}, ${escapeHtml(u.origin)}</li>`),
    `<li>${escapeHtml(kind)}; parameters ${escapeHtml(parametersOf(figure.recipe))}; engine ${escapeHtml(r.engineVersion)}</li>`,
  ].join('');
  return (
    `<figure class="live-figure">${picture}<figcaption><strong>${label}</strong> ${escapeHtml(caption)}` +
    `<p class="methods">${escapeHtml(r.methods)}</p>${cautions}<ul class="provenance">${provenance}</ul></figcaption></figure>`
  );
}
