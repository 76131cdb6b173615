import { Button, Flex, Spinner, Text } from '@radix-ui/themes';
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { FIGURE_KIND_LABELS, FIGURE_LIMITS, figureRecipeSchema, type ParsedFigureRecipe, specForResult } from '@upwell/common';
import { useFigure } from '../api/figures';
import { useSeriesList } from '../api/series';
import { ErrorNote } from '../components/ErrorNote';
import { FigureExports } from './FigureExports';
import { exportName } from './exports';
import { FigureChart, MethodsNote } from './FigureResultParts';
import { RecipeForm } from './RecipeForm';
import { useFigureEditors } from './use-figure-editors';
import { useNotebookEditor } from '../editor/notebook-context';

/** Props of a live figure as the document holds it. */
export interface FigureViewProps {
  notebookId: string;
  groupId: string;
  /** The figure node's id, for telling others whose settings are open. */
  figureId?: string | null;
  /** Position among the document's figures, from 1 (null while unknown). */
  figureNumber: number | null;
  recipe: Record<string, unknown> | null;
  caption: string;
  /** Lead and co-authors change settings and captions; reviewers and readers only see. */
  editable: boolean;
  onRecipeChange: (recipe: ParsedFigureRecipe) => void;
  onCaptionChange: (caption: string) => void;
}

function Caption({ label, caption, editable, onChange }: { label: string; caption: string; editable: boolean; onChange: (c: string) => void }) {
  const [text, setText] = useState(caption);
  const focused = useRef(false);
  // A co-author's caption edit shows at once, unless this person is typing in it.
  useEffect(() => {
    if (!focused.current) setText(caption);
  }, [caption]);
  if (!editable) return caption ? <span className="upwell-caption-text">{caption}</span> : <span className="upwell-caption-text upwell-muted">No caption yet.</span>;
  return (
    <textarea
      className="upwell-caption-input"
      aria-label={`Caption of ${label}`}
      placeholder="Say what the figure shows…"
      rows={2}
      maxLength={FIGURE_LIMITS.captionMax}
      value={text}
      onFocus={() => (focused.current = true)}
      onBlur={() => {
        focused.current = false;
        if (text !== caption) onChange(text);
      }}
      onChange={(e) => {
        setText(e.target.value);
        onChange(e.target.value);
      }}
    />
  );
}

/**
 * A live figure: "Figure N", its chart computed on the server, the caption,
 * the methods note with the data versions and cautions, exports, and (for
 * authors) its settings opening right under it.
 */
export function FigureView({ notebookId, groupId, figureNumber, recipe, caption, editable, onRecipeChange, onCaptionChange, figureId = null }: FigureViewProps) {
  const parsed = useMemo(() => (recipe ? figureRecipeSchema.safeParse(recipe) : null), [recipe]);
  const valid = parsed?.success ? parsed.data : null;
  const [editing, setEditing] = useState(editable && !recipe);
  const othersEditing = useFigureEditors(useNotebookEditor().awareness, figureId, editing);
  const query = useFigure(notebookId, valid);
  const series = useSeriesList(editing ? groupId : undefined, { pageSize: 200 });
  const label = figureNumber ? `Figure ${figureNumber}` : 'Figure';
  const kindLabel = valid ? FIGURE_KIND_LABELS[valid.kind] : null;
  const formId = useId();
  const spec = useMemo(() => (valid && query.data ? specForResult(query.data) : null), [valid, query.data]);

  let body: React.ReactNode;
  if (!recipe) {
    body = <p className="upwell-figure-empty">{editable ? 'Choose what this figure shows in its settings below.' : 'This figure has no settings yet; an author will choose what it shows.'}</p>;
  } else if (!valid) {
    body = (
      <p className="upwell-figure-empty" role="alert">
        This figure’s settings cannot be read ({parsed && !parsed.success ? parsed.error.issues[0]?.message : 'unknown reason'}).{' '}
        {editable ? 'Open its settings and save them again.' : 'Ask an author to open its settings and save them again.'}
      </p>
    );
  } else if (query.isPending) {
    body = (
      <Flex align="center" gap="2" className="upwell-figure-empty" role="status">
        <Spinner size="1" /> Computing {label.toLowerCase()} from the group’s series…
      </Flex>
    );
  } else if (query.error) {
    body = (
      <Flex direction="column" gap="2">
        <ErrorNote error={query.error} action={editable ? 'Check the figure’s settings (a bound series or version may be gone), then try again.' : 'Try again in a moment.'} />
        <div>
          <Button size="1" variant="soft" onClick={() => query.refetch()}>
            Compute {label.toLowerCase()} again
          </Button>
        </div>
      </Flex>
    );
  } else {
    body = <FigureChart result={query.data} label={`${label}: ${kindLabel}`} />;
  }

  return (
    <figure className="upwell-live-figure" aria-label={label} data-figure-number={figureNumber ?? undefined}>
      <Flex justify="between" align="center" className="upwell-figure-head">
        <Text size="1" className="upwell-figure-kind">
          {kindLabel ?? 'Live figure'}
          {query.isFetching && !query.isPending && <span role="status"> · updating…</span>}
        </Text>
        {editable && (
          <Button size="1" variant="ghost" aria-expanded={editing} aria-controls={formId} onClick={() => setEditing((e) => !e)}>
            {editing ? `Close ${label.toLowerCase()} settings` : `${label} settings`}
          </Button>
        )}
      </Flex>
      <div className="upwell-figure-body">{body}</div>
      <figcaption className="upwell-figcaption">
        <strong>{label}.</strong> <Caption label={label} caption={caption} editable={editable} onChange={onCaptionChange} />
      </figcaption>
      {valid && query.data && <MethodsNote result={query.data} />}
      {valid && query.data && <FigureExports result={query.data} spec={spec} baseName={exportName(figureNumber, kindLabel ?? 'figure')} />}
      {othersEditing.length > 0 && (
        <p className="upwell-figure-presence" role="status">
          {othersEditing.join(', ')} {othersEditing.length === 1 ? 'is' : 'are'} changing this figure’s settings.
        </p>
      )}
      {editable && editing && (
        <div id={formId} className="upwell-figure-settings">
          <RecipeForm
            initial={recipe}
            series={series.data?.items ?? []}
            seriesLoading={series.isPending}
            onSave={(r) => {
              onRecipeChange(r);
              setEditing(false);
            }}
            onCancel={recipe ? () => setEditing(false) : undefined}
          />
          <ErrorNote error={series.error} action="The series pickers need the library; try again in a moment." />
        </div>
      )}
    </figure>
  );
}
