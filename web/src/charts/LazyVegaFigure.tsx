import { Skeleton } from '@radix-ui/themes';
import { lazy, Suspense } from 'react';
import type { VisualizationSpec } from 'vega-embed';

// Vega is most of the client's weight: it loads in its own chunk, on the first figure.
const VegaFigure = lazy(() => import('./VegaFigure'));

/** A vega-lite figure, loaded on demand. */
export function LazyVegaFigure({ spec, label, height = 260 }: { spec: VisualizationSpec; label: string; height?: number }) {
  return (
    <Suspense fallback={<Skeleton height={`${height}px`} width="100%" />}>
      <VegaFigure spec={spec} label={label} />
    </Suspense>
  );
}
