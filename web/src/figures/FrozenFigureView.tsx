import { Flex, Text } from '@radix-ui/themes';
import { useMemo } from 'react';
import { FIGURE_KIND_LABELS, figureRecipeSchema, specForResult, type FigureResult, type UsedSeries } from '@upwell/common';
import { recipeParameters, shaPrefix } from '../snapshots/provenance';
import { exportName } from './exports';
import { FigureExports } from './FigureExports';
import { FigureChart, MethodsNote } from './FigureResultParts';

/** A figure as a snapshot froze it: the recipe with versions resolved, and the result computed at publication. */
export interface FrozenFigureData {
  ordinal: number;
  caption: string;
  recipe: Record<string, unknown> | null;
  result: FigureResult | null;
  error: string | null;
}

/** Which stored series versions a figure used, down to the sha256 of their values, and its parameters. */
function Provenance({ used, recipe }: { used: UsedSeries[]; recipe: Record<string, unknown> }) {
  const parameters = recipeParameters(recipe, used);
  return (
    <div className="upwell-methods upwell-frozen-provenance">
      <p className="upwell-methods-label">Provenance.</p>
      <ul aria-label="Series used">
        {used.map((u) => (
          <li key={`${u.seriesId}:${u.version}`}>
            {u.name} <span className="upwell-mono">v{u.version}</span> · {u.units || 'units not given'} · {u.origin === 'model-output' ? 'model output' : u.origin} · sha256{' '}
            <span className="upwell-mono">{shaPrefix(u.valuesSha256)}…</span>
          </li>
        ))}
      </ul>
      {parameters.length > 0 && (
        <p>
          <span className="upwell-methods-label">Parameters.</span>{' '}
          <span className="upwell-mono">{parameters.map((p) => `${p.name}: ${p.value}`).join('; ')}</span>
        </p>
      )}
    </div>
  );
}

/**
 * A figure of a snapshot, drawn from its stored result with the same chart
 * and spec builders as the live figure, without fetching anything: "Figure N",
 * the chart, caption, methods note with cautions, provenance and exports.
 */
export function FrozenFigureView({ figure }: { figure: FrozenFigureData }) {
  const parsed = useMemo(() => (figure.recipe ? figureRecipeSchema.safeParse(figure.recipe) : null), [figure.recipe]);
  const recipe = parsed?.success ? parsed.data : null;
  const label = `Figure ${figure.ordinal}`;
  const kindLabel = recipe ? FIGURE_KIND_LABELS[recipe.kind] : null;
  const spec = useMemo(() => (recipe && figure.result ? specForResult(figure.result) : null), [recipe, figure.result]);

  let body: React.ReactNode;
  if (!figure.result) {
    body = (
      <p className="upwell-figure-empty" role="note">
        This figure could not be computed when the snapshot was published{figure.error ? `: ${figure.error}` : '.'}
      </p>
    );
  } else if (!recipe) {
    body = <p className="upwell-figure-empty" role="note">This figure’s settings cannot be read, so its picture cannot be drawn.</p>;
  } else {
    body = <FigureChart result={figure.result} label={`${label}: ${kindLabel}`} />;
  }

  return (
    <figure className="upwell-live-figure upwell-frozen-figure" aria-label={label} data-figure-number={figure.ordinal}>
      <Flex justify="between" align="center" className="upwell-figure-head">
        <Text size="1" className="upwell-figure-kind">
          {kindLabel ?? 'Figure'} · as published
        </Text>
      </Flex>
      <div className="upwell-figure-body">{body}</div>
      <figcaption className="upwell-figcaption">
        <strong>{label}.</strong> {figure.caption ? <span className="upwell-caption-text">{figure.caption}</span> : <span className="upwell-caption-text upwell-muted">No caption.</span>}
      </figcaption>
      {figure.result && <MethodsNote result={figure.result} />}
      {figure.result && <Provenance used={figure.result.used} recipe={figure.recipe ?? {}} />}
      {recipe && figure.result && <FigureExports result={figure.result} spec={spec} baseName={exportName(figure.ordinal, kindLabel ?? 'figure')} />}
    </figure>
  );
}
