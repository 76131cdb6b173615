import type { VisualizationSpec } from 'vega-embed';

/** Width of exported figures in CSS pixels: a journal column at the document's measure. */
export const EXPORT_WIDTH = 640;

/**
 * A vega view of the spec rendered off screen, for export. Loaded lazily like
 * the on-screen figure, with the expression interpreter (no eval under CSP).
 */
async function headlessView(spec: VisualizationSpec) {
  const [vega, vl, { expressionInterpreter }] = await Promise.all([import('vega'), import('vega-lite'), import('vega-interpreter')]);
  // 'container' has no meaning off screen: export at a fixed column width.
  const fixed = { ...(spec as Record<string, unknown>), width: EXPORT_WIDTH, background: 'white' };
  const compiled = vl.compile(fixed as Parameters<typeof vl.compile>[0]).spec;
  const view = new vega.View(vega.parse(compiled, undefined, { ast: true }), { renderer: 'none', expr: expressionInterpreter });
  await view.runAsync();
  return view;
}

/** The figure as an SVG document. */
export async function figureSvg(spec: VisualizationSpec): Promise<string> {
  const view = await headlessView(spec);
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

/** The figure as a PNG data URL at twice the pixel density (sharp in print). */
export async function figurePngUrl(spec: VisualizationSpec): Promise<string> {
  const view = await headlessView(spec);
  try {
    return await view.toImageURL('png', 2);
  } finally {
    view.finalize();
  }
}

/** Saves text or a data URL as a file through a temporary link. */
export function saveFile(name: string, content: string, type: string): void {
  const url = content.startsWith('data:') ? content : URL.createObjectURL(new Blob([content], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  if (!content.startsWith('data:')) setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** "figure-3-lagged-correlation": a file name from the figure's number and kind. */
export function exportName(figureNumber: number | null, kindLabel: string): string {
  const slug = kindLabel.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
  return figureNumber ? `figure-${figureNumber}-${slug}` : slug;
}
