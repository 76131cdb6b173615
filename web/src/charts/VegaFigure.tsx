import { VegaEmbed } from 'react-vega';
import type { VisualizationSpec } from 'vega-embed';
import { expressionInterpreter } from 'vega-interpreter';

/**
 * Renders a vega-lite spec as SVG (prints cleanly, reads without hover).
 * Vega's expression interpreter is used instead of code generation, so the
 * page's Content-Security-Policy can keep forbidding eval.
 */
export default function VegaFigure({ spec, label }: { spec: VisualizationSpec; label: string }) {
  return (
    <div role="figure" aria-label={label} style={{ width: '100%' }}>
      <VegaEmbed
        spec={spec}
        options={{ renderer: 'svg', actions: false, ast: true, expr: expressionInterpreter, config: { font: 'Source Sans 3' } }}
        style={{ width: '100%' }}
      />
    </div>
  );
}
