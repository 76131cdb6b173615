import { Button, Flex, Text } from '@radix-ui/themes';
import { useId, useMemo } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { ParsedFigureRecipe, SeriesSummary } from '@upwell/common';
import { countMessages } from './form-fields';
import { APP_FORM_KINDS, changeKind, draftFromRecipe, FormKindsContext, type FormKinds, type RecipeDraft } from './form-kinds';

/**
 * The settings of one figure: what it shows, from which series and versions, and the
 * parameters of that kind (each kind's fields in figures/kinds/<kind>.tsx). react-hook-form holds
 * the draft; the zod resolver validates it with the shared recipe schema, puts each message
 * beside its field, and hands the parsed recipe (defaults filled in) to onSave.
 */
export function RecipeForm({
  initial,
  series,
  seriesLoading,
  onSave,
  onCancel,
  saveLabel = 'Save figure settings',
  kinds = APP_FORM_KINDS,
}: {
  initial: Record<string, unknown> | null;
  series: SeriesSummary[];
  seriesLoading?: boolean;
  onSave: (recipe: ParsedFigureRecipe) => void;
  onCancel?: () => void;
  saveLabel?: string;
  /** The kinds offered (the app's registry; a test may add a toy kind). */
  kinds?: FormKinds;
}) {
  const defaultValues = useMemo(() => draftFromRecipe(kinds, initial), [kinds, initial]);
  const form = useForm<RecipeDraft, unknown, ParsedFigureRecipe>({
    defaultValues,
    resolver: zodResolver(kinds.recipeSchema as never) as never,
    mode: 'onSubmit',
  });
  const kind = useWatch({ control: form.control, name: 'kind' });
  const kindId = useId();
  const issues = countMessages(form.formState.errors);
  const Fields = kinds.fields(kind);
  // Kinds that bind series (the time–latitude diagram binds a field) need the library.
  const bindsSeries = useMemo(() => JSON.stringify(kinds.defaultRecipe(kind)).includes('"seriesId"'), [kinds, kind]);

  return (
    <FormKindsContext.Provider value={kinds}>
      <FormProvider {...form}>
        <form className="upwell-recipe-form" onSubmit={form.handleSubmit((recipe) => onSave(recipe))} noValidate aria-label="Figure settings">
          <div className="upwell-field">
            <label htmlFor={kindId}>What the figure shows</label>
            <select id={kindId} value={kind} onChange={(e) => form.reset(changeKind(kinds, form.getValues(), e.target.value))}>
              {kinds.names.map((k) => (
                <option key={k} value={k}>
                  {kinds.label(k)}
                </option>
              ))}
            </select>
          </div>
          {seriesLoading && <Text size="1" color="gray">Loading the group’s series library…</Text>}
          {!seriesLoading && series.length === 0 && bindsSeries && (
            <Text size="1" color="gray" as="p">
              The group’s library has no series yet. Add one in the Series library, then come back to bind it here.
            </Text>
          )}
          <Fields key={kind} series={series} />
          {issues > 0 && (
            <Text size="1" color="red" as="p" role="alert">
              {issues === 1 ? 'One field needs attention' : `${issues} fields need attention`}; see the notes beside them.
            </Text>
          )}
          <Flex gap="2" mt="2">
            <Button type="submit">{saveLabel}</Button>
            {onCancel && (
              <Button type="button" variant="soft" color="gray" onClick={onCancel}>
                Cancel
              </Button>
            )}
          </Flex>
        </form>
      </FormProvider>
    </FormKindsContext.Provider>
  );
}
