/**
 * The fields of the recipe form, on react-hook-form: each field is a controller over a path of
 * the recipe, shows the zod resolver's message for that path, and takes its bounds from the
 * kind's recipe schema (numberBounds), so no limit is written twice.
 */
import { Button, Flex, Text } from '@radix-ui/themes';
import { useId, type ReactNode } from 'react';
import { useController, useFieldArray, useFormContext, useWatch, type FieldError as RhfError, type FieldErrors } from 'react-hook-form';
import {
  arrayMax,
  BUDGET_COLOURS,
  budgetColour,
  DEFAULT_EVENT_SOURCE,
  numberBounds,
  type SeriesSummary,
} from '@upwell/common';
import { useFields } from '../api/fields';
import { useEventSets } from '../api/event-sets';
import { useNotebookEditor } from '../editor/notebook-context';
import { FieldError } from './FieldError';
import { useFormKinds } from './form-kinds';
import { SeriesPicker, type BindingDraft } from './SeriesPicker';

/** What every kind's fields receive. */
export interface KindFieldsProps {
  /** The group's series library, for the pickers. */
  series: SeriesSummary[];
}

/** Every message at an error node and under it (a binding's error sits on its seriesId), joined once each. */
export function messagesUnder(node: unknown): string | undefined {
  const out: string[] = [];
  const visit = (n: unknown) => {
    if (!n || typeof n !== 'object') return;
    const e = n as Record<string, unknown>;
    if (typeof e.message === 'string' && e.message) out.push(e.message);
    for (const [k, v] of Object.entries(e)) if (k !== 'ref' && k !== 'message' && k !== 'type' && k !== 'types') visit(v);
  };
  visit(node);
  return out.length ? [...new Set(out)].join('; ') : undefined;
}

/** How many fields have a message (for the note under the form). */
export function countMessages(errors: FieldErrors): number {
  let n = 0;
  const visit = (e: unknown) => {
    if (!e || typeof e !== 'object') return;
    const r = e as Record<string, unknown>;
    if (typeof r.message === 'string' && r.message) n++;
    for (const [k, v] of Object.entries(r)) if (k !== 'ref' && k !== 'message' && k !== 'type' && k !== 'types') visit(v);
  };
  visit(errors);
  return n;
}

/** The recipe schema of the kind being edited, for reading bounds. */
function useKindSchema() {
  const kind = useWatch({ name: 'kind' }) as string;
  return useFormKinds().recipeOf(kind);
}

/** Bounds of a number field from the kind's schema (path without array indexes). */
function useBounds(path: string): { min?: number; max?: number } {
  return numberBounds(useKindSchema(), path.split('.').filter((p) => !/^\d+$/.test(p)));
}

/** A number from an input: empty stays invalid (NaN) so the schema says so, unless the field is optional. */
const toNumber = (v: string, optional = false) => (v.trim() === '' ? (optional ? undefined : Number.NaN) : Number(v));

export function NumberField({ path, label, step = 1, optional, hint }: { path: string; label: string; step?: number; optional?: boolean; hint?: string }) {
  const id = useId();
  const { field, fieldState } = useController({ name: path });
  const { min, max } = useBounds(path);
  const error = messagesUnder(fieldState.error);
  const v = field.value;
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="number"
        inputMode="decimal"
        step={step}
        min={min}
        max={max}
        value={typeof v === 'number' && Number.isFinite(v) ? v : ''}
        placeholder={optional ? 'none' : undefined}
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-e` : hint ? `${id}-h` : undefined}
        onChange={(e) => field.onChange(toNumber(e.target.value, optional))}
        onBlur={field.onBlur}
      />
      {hint && !error && (
        <span id={`${id}-h`} className="upwell-field-hint">
          {hint}
        </span>
      )}
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

export function TextField({ path, label, placeholder }: { path: string; label: string; placeholder?: string }) {
  const id = useId();
  const { field, fieldState } = useController({ name: path });
  const error = messagesUnder(fieldState.error);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        value={String(field.value ?? '')}
        placeholder={placeholder}
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-e` : undefined}
        onChange={(e) => field.onChange(e.target.value)}
        onBlur={field.onBlur}
      />
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

export function ChoiceField({ path, label, options }: { path: string; label: string; options: [string, string][] }) {
  const id = useId();
  const { field, fieldState } = useController({ name: path });
  const error = messagesUnder(fieldState.error);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={String(field.value ?? '')} onChange={(e) => field.onChange(e.target.value)} aria-describedby={error ? `${id}-e` : undefined}>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

export function CheckField({ path, label }: { path: string; label: string }) {
  const id = useId();
  const { field } = useController({ name: path });
  return (
    <div className="upwell-field upwell-field-check">
      <input id={id} type="checkbox" checked={field.value === true} onChange={(e) => field.onChange(e.target.checked)} />
      <label htmlFor={id}>{label}</label>
    </div>
  );
}

/** A choice among named things (event sets, fields), saying what to do when there is none. */
export function NamedChoiceField({ path, label, options, empty }: { path: string; label: string; options: { value: string; label: string }[]; empty: string }) {
  const id = useId();
  const { field, fieldState } = useController({ name: path });
  const error = messagesUnder(fieldState.error);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={String(field.value ?? '')} onChange={(e) => field.onChange(e.target.value)} aria-invalid={!!error || undefined} aria-describedby={error ? `${id}-e` : undefined}>
        <option value="">{options.length ? 'Choose…' : '—'}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {!options.length && <span className="upwell-field-hint">{empty}</span>}
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

/** A fieldset with its legend and the message of an object-level rule (e.g. a reversed period). */
export function Group({ legend, children, path }: { legend: string; children: ReactNode; path?: string }) {
  const id = useId();
  const { formState, getFieldState } = useFormContext();
  // Only the group's own message: its fields show theirs.
  const own = path ? (getFieldState(path, formState).error as RhfError | undefined)?.message : undefined;
  return (
    <fieldset className="upwell-fieldset" aria-describedby={own ? id : undefined}>
      <legend>{legend}</legend>
      {children}
      <FieldError id={id} message={own} />
    </fieldset>
  );
}

/** A series binding. */
export function Binding({ path, label, noneLabel, series }: { path: string; label: string; noneLabel?: string; series: SeriesSummary[] }) {
  const { field, fieldState } = useController({ name: path });
  return <SeriesPicker label={label} value={field.value as BindingDraft | undefined} onChange={field.onChange} series={series} error={messagesUnder(fieldState.error)} noneLabel={noneLabel} />;
}

/** The base period of anomalies, with the message of a reversed period on the group. */
export function BasePeriod({ path }: { path: string }) {
  return (
    <Group legend="Base period" path={path}>
      <Flex gap="3" wrap="wrap">
        <TextField path={`${path}.from`} label="From (YYYY-MM)" placeholder="1991-01" />
        <TextField path={`${path}.to`} label="To (YYYY-MM)" placeholder="2020-12" />
      </Flex>
    </Group>
  );
}

/** How anomalies are made (recipes with an `anomaly` field). */
export function AnomalyFields() {
  return (
    <>
      <BasePeriod path="anomaly.base" />
      <Group legend="Anomalies">
        <Flex gap="3" wrap="wrap">
          <ChoiceField path="anomaly.method" label="Climatology" options={[['monthly-mean', 'Monthly means'], ['harmonic', 'Harmonic fit']]} />
          <NumberField path="anomaly.smooth" label="Smoothing (odd number of months)" step={2} />
        </Flex>
        <Flex gap="4" wrap="wrap">
          <CheckField path="anomaly.standardize" label="Standardize (divide by the standard deviation)" />
          <CheckField path="anomaly.detrend" label="Remove the linear trend" />
        </Flex>
      </Group>
    </>
  );
}

/** The notebook's saved event sets, as choices for the recipe form. */
function useEventSetChoices(): { value: string; label: string }[] {
  const { notebookId } = useNotebookEditor();
  const sets = useEventSets(notebookId).list.data ?? [];
  return sets.map((s) => ({ value: s.id, label: `${s.name} (${s.events.length} events)` }));
}

/** The group's stored zonal-mean fields, as choices for the time–latitude recipe. */
export function useZonalFieldChoices(): { value: string; label: string }[] {
  const { groupId } = useNotebookEditor();
  const fields = useFields(groupId);
  return (fields.data?.zonal ?? []).map((z) => ({ value: z.id, label: `${z.name} (${z.start}, ${z.months} months)` }));
}

/** A saved event set of the notebook (asked of the server only when this choice is shown). */
function EventSetChoice() {
  return <NamedChoiceField path="events.eventSetId" label="Event set" options={useEventSetChoices()} empty="No event set saved yet: detect and save one under “Event sets”." />;
}

/** Which events a recipe uses: the rule (its defaults from the schema) or a saved set. */
export function EventFields() {
  const id = useId();
  const { field } = useController({ name: 'events' });
  const from = useWatch({ name: 'events.from' });
  return (
    <Group legend="Events" path="events">
      <div className="upwell-field">
        <label htmlFor={id}>Which events</label>
        <select id={id} value={String(from)} onChange={(e) => field.onChange(e.target.value === 'rule' ? { ...DEFAULT_EVENT_SOURCE } : { from: 'event-set', eventSetId: '' })}>
          <option value="rule">Detected from the index by a rule</option>
          <option value="event-set">A saved event set</option>
        </select>
      </div>
      {from === 'rule' ? (
        <Flex gap="3" wrap="wrap">
          <NumberField path="events.threshold" label="Threshold (index units)" step={0.1} />
          <NumberField path="events.minDuration" label="Minimum duration (months)" />
          <NumberField path="events.smooth" label="Smoothing (odd number of months)" step={2} />
          <NumberField path="events.roundTo" label="Round index to (decimals)" optional />
        </Flex>
      ) : (
        <EventSetChoice />
      )}
    </Group>
  );
}

/** Budget terms: a name (with the colour it gets) and a series each. */
export function BudgetTerms({ series }: KindFieldsProps) {
  const { control, formState, getFieldState } = useFormContext();
  const { fields, append, remove } = useFieldArray({ control, name: 'terms' });
  const terms = useWatch({ name: 'terms' }) as { name: string }[] | undefined;
  const max = arrayMax(useKindSchema(), ['terms']) ?? Infinity;
  const listId = useId();
  return (
    <Group legend="Budget terms (summed and compared with the tendency)" path="terms">
      <datalist id={listId}>
        {Object.keys(BUDGET_COLOURS)
          .filter((n) => n !== 'tendency' && n !== 'residual')
          .map((n) => (
            <option key={n} value={n} />
          ))}
      </datalist>
      {fields.map((f, i) => {
        const nameError = messagesUnder(getFieldState(`terms.${i}.name`, formState).error);
        return (
          <div key={f.id} className="upwell-budget-term">
            <span className="upwell-swatch" style={{ background: budgetColour(terms?.[i]?.name ?? '') }} aria-hidden />
            <TermName index={i} listId={listId} error={nameError} />
            <Binding path={`terms.${i}.series`} label={`Term ${i + 1} series`} series={series} />
            <Button type="button" size="1" variant="ghost" color="gray" aria-label={`Remove term ${i + 1}`} onClick={() => remove(i)}>
              Remove
            </Button>
          </div>
        );
      })}
      {fields.length < max && (
        <Button type="button" size="1" variant="soft" onClick={() => append({ name: '', series: { seriesId: '', version: 'latest' } })}>
          Add a budget term
        </Button>
      )}
    </Group>
  );
}

function TermName({ index, listId, error }: { index: number; listId: string; error?: string }) {
  const { field } = useController({ name: `terms.${index}.name` });
  const id = `${listId}-${index}`;
  return (
    <div className="upwell-field">
      <label htmlFor={id}>Term {index + 1} name</label>
      <input id={id} list={listId} value={String(field.value ?? '')} onChange={(e) => field.onChange(e.target.value)} aria-invalid={!!error || undefined} />
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}

/** Carbon series reported per event (the event table). */
export function CarbonList({ series }: KindFieldsProps) {
  const { control } = useFormContext();
  const { fields, append, remove } = useFieldArray({ control, name: 'carbon' });
  const max = arrayMax(useKindSchema(), ['carbon']) ?? Infinity;
  return (
    <Group legend="Carbon series reported per event (change in Pg C)">
      {fields.length === 0 && <Text size="1" color="gray">None yet: the table lists the events only.</Text>}
      {fields.map((f, i) => (
        <Flex key={f.id} gap="2" align="end">
          <Binding path={`carbon.${i}`} label={`Carbon series ${i + 1}`} series={series} />
          <Button type="button" size="1" variant="ghost" color="gray" aria-label={`Remove carbon series ${i + 1}`} onClick={() => remove(i)}>
            Remove
          </Button>
        </Flex>
      ))}
      {fields.length < max && (
        <Button type="button" size="1" variant="soft" onClick={() => append({ seriesId: '', version: 'latest' })}>
          Add a carbon series
        </Button>
      )}
    </Group>
  );
}
