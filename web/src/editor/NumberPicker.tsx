import { Button, Dialog, Flex, Spinner, Text } from '@radix-ui/themes';
import { useQueries } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { FIGURE_KIND_LABELS, figureRecipeSchema, type FigureKind, formatLiveNumber, canonicalJSON } from '@upwell/common';
import { figureQueryOptions } from '../api/figures';
import type { LiveNumberChoice } from './commands';
import { shortcutLabel } from './commands';
import { useFigureEntries, useNotebookEditor } from './notebook-context';

/**
 * Chooses a live number from the numbers the document's figures offer (read
 * from the same cache the figures fill), and its precision.
 */
export function NumberPicker({ open, onOpenChange, onInsert }: { open: boolean; onOpenChange: (o: boolean) => void; onInsert: (choice: LiveNumberChoice) => void }) {
  const { notebookId } = useNotebookEditor();
  const figures = useFigureEntries();
  const parsed = figures.map((f) => {
    const p = f.recipe ? figureRecipeSchema.safeParse(f.recipe) : null;
    return { ...f, valid: p?.success ? p.data : null };
  });
  // One query per distinct recipe (two figures may show the same one).
  const distinct = [...new Map(parsed.filter((f) => f.valid).map((f) => [canonicalJSON(f.valid), f.valid!])).entries()];
  const answers = useQueries({ queries: distinct.map(([, r]) => ({ ...figureQueryOptions(notebookId, r), enabled: open })) });
  const byRecipe = new Map(distinct.map(([json], i) => [json, answers[i]]));
  const results = parsed.map((f) => (f.valid ? byRecipe.get(canonicalJSON(f.valid)) : undefined));
  const [choice, setChoice] = useState<string>('');
  const [precision, setPrecision] = useState(2);
  const formId = useId();

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const [i, key] = [Number(choice.split('\u0000')[0]), choice.split('\u0000')[1]];
    const f = parsed[i];
    if (!f?.valid || !key) return;
    onInsert({ recipe: f.valid, key, precision: Math.min(6, Math.max(0, Math.round(precision))), figureId: f.id });
    setChoice('');
  };

  return (
    <Dialog.Root open={open} onOpenChange={onOpenChange}>
      <Dialog.Content maxWidth="560px" aria-describedby={`${formId}-d`}>
        <Dialog.Title size="4">Insert a live number</Dialog.Title>
        <Dialog.Description size="2" color="gray" id={`${formId}-d`} mb="3">
          A live number is one of a figure’s results written into the text; it changes when the figure does. Shortcut {shortcutLabel('n')}, or type /number then Enter.
        </Dialog.Description>
        <form onSubmit={submit} aria-label="Choose a live number">
          {figures.length === 0 && (
            <Text as="p" size="2">
              This notebook has no figures yet. Insert a figure ({shortcutLabel('f')}) and choose its settings; the numbers it offers appear here.
            </Text>
          )}
          <Flex direction="column" gap="3" className="upwell-number-choices">
            {parsed.map((f, i) => {
              const q = results[i];
              const name = `Figure ${i + 1}${f.valid ? ` · ${FIGURE_KIND_LABELS[f.valid.kind as FigureKind]}` : ''}`;
              return (
                <fieldset key={`${f.id}-${i}`} className="upwell-fieldset">
                  <legend>{name}</legend>
                  {!f.valid && <Text size="1" color="gray">No settings yet, so no numbers.</Text>}
                  {f.valid && q?.isPending && (
                    <Flex gap="2" align="center" role="status">
                      <Spinner size="1" />
                      <Text size="1">Computing its numbers…</Text>
                    </Flex>
                  )}
                  {f.valid && q?.error && <Text size="1" color="red">Its numbers could not be computed: {q.error.message}</Text>}
                  {q?.data && q.data.numbers.length === 0 && <Text size="1" color="gray">This figure offers no numbers.</Text>}
                  {q?.data?.numbers.map((n) => {
                    const value = `${i}\u0000${n.key}`;
                    return (
                      <label key={n.key} className="upwell-number-choice">
                        <input type="radio" name={`${formId}-n`} value={value} checked={choice === value} onChange={() => setChoice(value)} />
                        <span>{n.label}</span>
                        <span className="upwell-mono">{formatLiveNumber(n.value, precision, n.units).text}</span>
                      </label>
                    );
                  })}
                </fieldset>
              );
            })}
          </Flex>
          <Flex gap="3" align="end" mt="4" justify="between" wrap="wrap">
            <div className="upwell-field">
              <label htmlFor={`${formId}-p`}>Decimal places</label>
              <input id={`${formId}-p`} type="number" min={0} max={6} step={1} value={precision} onChange={(e) => setPrecision(Number(e.target.value) || 0)} />
            </div>
            <Flex gap="2">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" disabled={!choice}>
                Insert number
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
