import { specForResult, type FigureResult } from '@upwell/common';

// vega and vega-lite are ESM-only; the CommonJS build keeps import() as import() (module: node20).
type Vega = typeof import('vega');
type VegaLite = typeof import('vega-lite');
let libraries: Promise<[Vega, VegaLite]> | undefined;

/** Width of figures in snapshot files, in CSS pixels: one column at the document's measure. */
export const SNAPSHOT_FIGURE_WIDTH = 640;

/**
 * The frozen figure as an SVG document, drawn headless with the same vega-lite spec builders
 * the web uses; null for kinds drawn as a table (the event table).
 */
export async function figureSvg(result: FigureResult): Promise<string | null> {
  const spec = specForResult(result);
  if (!spec) return null;
  libraries ??= Promise.all([import('vega'), import('vega-lite')]);
  const [vega, vl] = await libraries;
  // 'container' has no meaning off screen: a fixed column width on white, as the web's export.
  const fixed = { ...(spec as unknown as Record<string, unknown>), width: SNAPSHOT_FIGURE_WIDTH, background: 'white' };
  const compiled = vl.compile(fixed as Parameters<VegaLite['compile']>[0]).spec;
  const view = new vega.View(vega.parse(compiled), { renderer: 'none' });
  try {
    await view.runAsync();
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
