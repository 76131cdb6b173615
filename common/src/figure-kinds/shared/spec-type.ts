import type { TopLevelSpec } from 'vega-lite';

/**
 * A figure's vega-lite specification, as the web draws it and the server renders it to SVG for
 * snapshot files. Type only: common itself never loads vega-lite.
 */
export type FigureSpec = TopLevelSpec;
