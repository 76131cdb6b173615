import { useId, useMemo, useState } from 'react';
import { FIGURE_KIND_LABELS, figureRecipeSchema, type FigureKind, formatLiveNumber, formatVersionsUsed } from '@upwell/common';
import { useFigure } from '../api/figures';

/** Attributes of a live number as the document holds them. */
export interface LiveNumberViewProps {
  notebookId: string;
  recipe: Record<string, unknown> | null;
  numberKey: string;
  precision: number;
  /** The number of the figure it was taken from, when that figure is in the document. */
  figureNumber: number | null;
  selected?: boolean;
}

/**
 * A number in the text computed from a recipe: the value with its units, "…"
 * while computing, a marked "n/a" when it cannot be had. Hover or focus says
 * where it comes from.
 */
export function LiveNumberView({ notebookId, recipe, numberKey, precision, figureNumber, selected }: LiveNumberViewProps) {
  const parsed = useMemo(() => (recipe ? figureRecipeSchema.safeParse(recipe) : null), [recipe]);
  const valid = parsed?.success ? parsed.data : null;
  const query = useFigure(notebookId, valid, { as: 'number' });
  const [open, setOpen] = useState(false);
  const tipId = useId();
  const number = query.data?.numbers.find((n) => n.key === numberKey);
  const source = figureNumber ? `Figure ${figureNumber}` : valid ? FIGURE_KIND_LABELS[valid.kind as FigureKind] : 'no figure';

  let text: string;
  let state: 'value' | 'computing' | 'unavailable';
  let why = '';
  if (!valid) {
    text = 'n/a';
    state = 'unavailable';
    why = 'Its recipe is missing or cannot be read.';
  } else if (query.isPending) {
    text = '…';
    state = 'computing';
    why = 'Computing…';
  } else if (query.error) {
    text = 'n/a';
    state = 'unavailable';
    why = `It could not be computed: ${query.error.message}`;
  } else if (!number) {
    text = 'n/a';
    state = 'unavailable';
    why = `${source} no longer offers this number.`;
  } else {
    const f = formatLiveNumber(number.value, precision, number.units);
    text = f.text;
    state = f.state;
    if (f.state === 'unavailable') why = 'The data do not define this value (too few months, or missing values).';
  }

  const kind = valid ? FIGURE_KIND_LABELS[valid.kind as FigureKind] : null;
  return (
    <span className="upwell-live-number-wrap">
      <span
        className={`upwell-live-number upwell-live-number-${state}${selected ? ' is-selected' : ''}`}
        tabIndex={0}
        role="button"
        aria-label={`Live number: ${number?.label ?? numberKey}, ${state === 'computing' ? 'computing' : text}`}
        aria-describedby={tipId}
        aria-expanded={open}
        // Enter or Space shows where the number comes from (a button that discloses its source).
        onClick={() => setOpen((o) => !o)}
        onMouseEnter={() => setOpen(true)}
        onMouseLeave={() => setOpen(false)}
        onFocus={() => setOpen(true)}
        onBlur={() => setOpen(false)}
        onKeyDown={(e) => {
          if (e.key === 'Escape') setOpen(false);
          if (e.key === 'Enter' || e.key === ' ') {
            e.preventDefault();
            setOpen((o) => !o);
          }
        }}
      >
        {state === 'unavailable' && <span aria-hidden>⚠ </span>}
        {text}
      </span>
      <span id={tipId} role="tooltip" className="upwell-number-tip" hidden={!open}>
        <strong>{number?.label ?? numberKey}</strong>
        <br />
        From {source}
        {figureNumber && kind ? ` (${kind})` : ''}
        {query.data && (
          <>
            <br />
            Data: {formatVersionsUsed(query.data.used)}
          </>
        )}
        {why && (
          <>
            <br />
            {why}
          </>
        )}
      </span>
    </span>
  );
}
