import type { VisualizationSpec } from 'vega-embed';
import { formatMonth, parseMonth } from '@upwell/common';

/** A monthly series over time as a line, with its units on the y axis; gaps stay gaps. */
export function seriesLineSpec(start: string, values: (number | null)[], units: string, title: string): VisualizationSpec {
  const first = parseMonth(start);
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    width: 'container',
    height: 240,
    data: { values: values.map((v, i) => ({ month: `${formatMonth(first + i)}-15`, value: v })) },
    mark: { type: 'line', strokeWidth: 1.25, color: '#0f5e5c' },
    encoding: {
      x: { field: 'month', type: 'temporal', title: 'Month' },
      y: { field: 'value', type: 'quantitative', title: units ? `${title} (${units})` : title, scale: { zero: false } },
    },
    config: { axis: { labelFontSize: 11, titleFontSize: 12 }, view: { stroke: null } },
  };
}
