import { Button, Flex, Text } from '@radix-ui/themes';
import { useId, useMemo, useState, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { api } from '../api/client';
import { useEventSets } from '../api/event-sets';
import { useNotebookEditor } from '../editor/notebook-context';
import type { FieldsList } from '@upwell/common';
import { FIGURE_KIND_LABELS, FIGURE_LIMITS, figureRecipeSchema, type FigureKind, type ParsedFigureRecipe, type SeriesSummary, BUDGET_COLOURS, budgetColour } from '@upwell/common';
import { FieldError } from './FieldError';
import { changeKind, draftFromRecipe, getAt, setAt, type RecipeDraft } from './recipe-defaults';
import { SeriesPicker, type BindingDraft } from './SeriesPicker';

type Path = (string | number)[];

/** Validation messages keyed by the path of the field they belong to. */
type Issues = { path: Path; message: string }[];

interface FormApi {
  draft: RecipeDraft;
  set: (path: Path, value: unknown) => void;
  /** Messages for a field and everything under it. */
  error: (path: Path) => string | undefined;
  /** Messages for the field itself only (an object-level rule such as a reversed period). */
  exactError: (path: Path) => string | undefined;
  series: SeriesSummary[];
}

const starts = (p: Path, prefix: Path) => prefix.every((k, i) => p[i] === k);

/** A number from an input: empty stays invalid (NaN) so the schema says so, unless the field is optional. */
const toNumber = (v: string, optional = false) => (v.trim() === '' ? (optional ? undefined : Number.NaN) : Number(v));

function NumberField({ f, path, label, step = 1, min, max, optional, hint }: { f: FormApi; path: Path; label: string; step?: number; min?: number; max?: number; optional?: boolean; hint?: string }) {
  const id = useId();
  const v = getAt(f.draft, path);
  const error = f.error(path);
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
        onChange={(e) => f.set(path, toNumber(e.target.value, optional))}
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

/** The notebook's saved event sets, as choices for the recipe form. */
function useEventSetChoices(): { value: string; label: string }[] {
  const { notebookId } = useNotebookEditor();
  const sets = useEventSets(notebookId).list.data ?? [];
  return sets.map((s) => ({ value: s.id, label: `${s.name} (${s.events.length} events)` }));
}

/** The group's stored zonal-mean fields, as choices for the time–latitude recipe. */
function useZonalFieldChoices(): { value: string; label: string }[] {
  const { groupId } = useNotebookEditor();
  const fields = useQuery({ queryKey: ['fields', groupId], queryFn: () => api<FieldsList>(`/groups/${groupId}/fields`), enabled: !!groupId });
  return (fields.data?.zonal ?? []).map((z) => ({ value: z.id, label: `${z.name} (${z.start}, ${z.months} months)` }));
}

/** A choice among named things (event sets, fields), saying what to do when there is none. */
function NamedChoiceField({ f, path, label, options, empty }: { f: FormApi; path: Path; label: string; options: { value: string; label: string }[]; empty: string }) {
  const id = useId();
  const error = f.error(path);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={String(getAt(f.draft, path) ?? '')} onChange={(e) => f.set(path, e.target.value)} aria-invalid={!!error || undefined} aria-describedby={error ? `${id}-e` : undefined}>
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

function TextField({ f, path, label, placeholder, hint, pattern }: { f: FormApi; path: Path; label: string; placeholder?: string; hint?: string; pattern?: string }) {
  const id = useId();
  const error = f.error(path);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        value={String(getAt(f.draft, path) ?? '')}
        placeholder={placeholder}
        pattern={pattern}
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-e` : hint ? `${id}-h` : undefined}
        onChange={(e) => f.set(path, e.target.value)}
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

function ChoiceField({ f, path, label, options }: { f: FormApi; path: Path; label: string; options: [string, string][] }) {
  const id = useId();
  const error = f.error(path);
  return (
    <div className="upwell-field">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={String(getAt(f.draft, path) ?? '')} onChange={(e) => f.set(path, e.target.value)} aria-describedby={error ? `${id}-e` : undefined}>
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

function CheckField({ f, path, label }: { f: FormApi; path: Path; label: string }) {
  const id = useId();
  return (
    <div className="upwell-field upwell-field-check">
      <input id={id} type="checkbox" checked={getAt(f.draft, path) === true} onChange={(e) => f.set(path, e.target.checked)} />
      <label htmlFor={id}>{label}</label>
    </div>
  );
}

function Group({ legend, children, error }: { legend: string; children: ReactNode; error?: string }) {
  const id = useId();
  return (
    <fieldset className="upwell-fieldset" aria-describedby={error ? id : undefined}>
      <legend>{legend}</legend>
      {children}
      <FieldError id={id} message={error} />
    </fieldset>
  );
}

function Binding({ f, path, label, noneLabel }: { f: FormApi; path: Path; label: string; noneLabel?: string }) {
  return (
    <SeriesPicker
      label={label}
      value={getAt(f.draft, path) as BindingDraft | undefined}
      onChange={(b) => f.set(path, b)}
      series={f.series}
      error={f.error(path)}
      noneLabel={noneLabel}
    />
  );
}

/** The base period of anomalies: own message for a reversed period (the schema's refine lands on the object). */
function BasePeriod({ f, path }: { f: FormApi; path: Path }) {
  return (
    <Group legend="Base period" error={f.exactError(path)}>
      <Flex gap="3" wrap="wrap">
        <TextField f={f} path={[...path, 'from']} label="From (YYYY-MM)" placeholder="1991-01" />
        <TextField f={f} path={[...path, 'to']} label="To (YYYY-MM)" placeholder="2020-12" />
      </Flex>
    </Group>
  );
}

function AnomalyFields({ f }: { f: FormApi }) {
  return (
    <>
      <BasePeriod f={f} path={['anomaly', 'base']} />
      <Group legend="Anomalies">
        <Flex gap="3" wrap="wrap">
          <ChoiceField f={f} path={['anomaly', 'method']} label="Climatology" options={[['monthly-mean', 'Monthly means'], ['harmonic', 'Harmonic fit']]} />
          <NumberField f={f} path={['anomaly', 'smooth']} label="Smoothing (odd number of months)" step={2} min={1} max={61} />
        </Flex>
        <Flex gap="4" wrap="wrap">
          <CheckField f={f} path={['anomaly', 'standardize']} label="Standardize (divide by the standard deviation)" />
          <CheckField f={f} path={['anomaly', 'detrend']} label="Remove the linear trend" />
        </Flex>
      </Group>
    </>
  );
}

function EventFields({ f }: { f: FormApi }) {
  const from = getAt(f.draft, ['events', 'from']);
  const id = useId();
  return (
    <Group legend="Events" error={f.exactError(['events'])}>
      <div className="upwell-field">
        <label htmlFor={id}>Which events</label>
        <select
          id={id}
          value={String(from)}
          onChange={(e) => f.set(['events'], e.target.value === 'rule' ? { from: 'rule', threshold: 0.5, minDuration: 5, smooth: 3 } : { from: 'event-set', eventSetId: '' })}
        >
          <option value="rule">Detected from the index by a rule</option>
          <option value="event-set">A saved event set</option>
        </select>
      </div>
      {from === 'rule' ? (
        <Flex gap="3" wrap="wrap">
          <NumberField f={f} path={['events', 'threshold']} label="Threshold (index units)" step={0.1} min={0} max={10} />
          <NumberField f={f} path={['events', 'minDuration']} label="Minimum duration (months)" min={1} max={60} />
          <NumberField f={f} path={['events', 'smooth']} label="Smoothing (odd number of months)" step={2} min={1} max={61} />
          <NumberField f={f} path={['events', 'roundTo']} label="Round index to (decimals)" min={0} max={6} optional />
        </Flex>
      ) : (
        <NamedChoiceField f={f} path={['events', 'eventSetId']} label="Event set" options={useEventSetChoices()} empty="No event set saved yet: detect and save one under “Event sets”." />
      )}
    </Group>
  );
}

function BudgetTerms({ f }: { f: FormApi }) {
  const terms = (getAt(f.draft, ['terms']) as { name: string; series: BindingDraft }[]) ?? [];
  const listId = useId();
  return (
    <Group legend="Budget terms (summed and compared with the tendency)" error={f.exactError(['terms'])}>
      <datalist id={listId}>
        {Object.keys(BUDGET_COLOURS)
          .filter((n) => n !== 'tendency' && n !== 'residual')
          .map((n) => (
            <option key={n} value={n} />
          ))}
      </datalist>
      {terms.map((t, i) => (
        <div key={i} className="upwell-budget-term">
          <span className="upwell-swatch" style={{ background: budgetColour(t.name) }} aria-hidden />
          <div className="upwell-field">
            <label htmlFor={`${listId}-${i}`}>Term {i + 1} name</label>
            <input id={`${listId}-${i}`} list={listId} value={t.name} onChange={(e) => f.set(['terms', i, 'name'], e.target.value)} aria-invalid={!!f.error(['terms', i, 'name']) || undefined} />
            <FieldError id={`${listId}-${i}-e`} message={f.error(['terms', i, 'name'])} />
          </div>
          <Binding f={f} path={['terms', i, 'series']} label={`Term ${i + 1} series`} />
          <Button type="button" size="1" variant="ghost" color="gray" aria-label={`Remove term ${i + 1}`} onClick={() => f.set(['terms'], terms.filter((_, j) => j !== i))}>
            Remove
          </Button>
        </div>
      ))}
      {terms.length < FIGURE_LIMITS.maxBoundSeries && (
        <Button type="button" size="1" variant="soft" onClick={() => f.set(['terms'], [...terms, { name: '', series: { seriesId: '', version: 'latest' } }])}>
          Add a budget term
        </Button>
      )}
    </Group>
  );
}

function CarbonList({ f }: { f: FormApi }) {
  const carbon = (getAt(f.draft, ['carbon']) as BindingDraft[]) ?? [];
  return (
    <Group legend="Carbon series reported per event (change in Pg C)">
      {carbon.length === 0 && <Text size="1" color="gray">None yet: the table lists the events only.</Text>}
      {carbon.map((_, i) => (
        <Flex key={i} gap="2" align="end">
          <Binding f={f} path={['carbon', i]} label={`Carbon series ${i + 1}`} />
          <Button type="button" size="1" variant="ghost" color="gray" aria-label={`Remove carbon series ${i + 1}`} onClick={() => f.set(['carbon'], carbon.filter((__, j) => j !== i))}>
            Remove
          </Button>
        </Flex>
      ))}
      {carbon.length < FIGURE_LIMITS.maxBoundSeries && (
        <Button type="button" size="1" variant="soft" onClick={() => f.set(['carbon'], [...carbon, { seriesId: '', version: 'latest' }])}>
          Add a carbon series
        </Button>
      )}
    </Group>
  );
}

function KindFields({ f }: { f: FormApi }) {
  switch (f.draft.kind) {
    case 'timeseries':
      return (
        <>
          <Binding f={f} path={['series']} label="Series" />
          <ChoiceField f={f} path={['show']} label="Show" options={[['anomaly', 'Anomaly'], ['raw', 'Values as stored']]} />
          <Binding f={f} path={['index']} label="Index for event shading" noneLabel="The series itself" />
          <AnomalyFields f={f} />
          <EventFields f={f} />
        </>
      );
    case 'seasonal-cycle':
      return (
        <>
          <Binding f={f} path={['series']} label="Series" />
          <BasePeriod f={f} path={['base']} />
        </>
      );
    case 'lag-correlation':
      return (
        <>
          <Binding f={f} path={['index']} label="Climate index" />
          <Binding f={f} path={['series']} label="Carbon series" />
          <Group legend="Correlation">
            <Flex gap="3" wrap="wrap">
              <NumberField f={f} path={['maxLag']} label="Lags from −N to N months" min={0} max={FIGURE_LIMITS.maxLag} />
              <ChoiceField f={f} path={['method']} label="Correlation" options={[['pearson', 'Pearson'], ['spearman', 'Spearman (ranks)']]} />
              <NumberField f={f} path={['alpha']} label="Significance level α" step={0.01} min={0.001} max={0.49} />
            </Flex>
          </Group>
          <AnomalyFields f={f} />
        </>
      );
    case 'composite':
      return (
        <>
          <Binding f={f} path={['index']} label="Climate index" />
          <Binding f={f} path={['series']} label="Carbon series" />
          <Group legend="Composite">
            <Flex gap="3" wrap="wrap">
              <ChoiceField f={f} path={['phase']} label="Events" options={[['warm', 'Warm events'], ['cold', 'Cold events']]} />
              <NumberField f={f} path={['before']} label="Months before the peak" min={0} max={FIGURE_LIMITS.maxCompositeOffset} />
              <NumberField f={f} path={['after']} label="Months after the peak" min={0} max={FIGURE_LIMITS.maxCompositeOffset} />
              <NumberField f={f} path={['confidence']} label="Confidence level" step={0.01} min={0.5} max={0.999} />
            </Flex>
          </Group>
          <AnomalyFields f={f} />
          <EventFields f={f} />
        </>
      );
    case 'event-table':
      return (
        <>
          <Binding f={f} path={['index']} label="Climate index" />
          <CarbonList f={f} />
          <AnomalyFields f={f} />
          <EventFields f={f} />
        </>
      );
    case 'budget':
      return (
        <>
          <Binding f={f} path={['tendency']} label="Tendency (rate of change of the inventory)" />
          <BudgetTerms f={f} />
        </>
      );
    case 'hovmoller':
      return (
        <>
          <NamedChoiceField f={f} path={['zonalFieldId']} label="Zonal-mean field" options={useZonalFieldChoices()} empty="No zonal-mean field yet: keep a gridded NetCDF variable from an upload and make a zonal mean of it." />
          <ChoiceField f={f} path={['show']} label="Show" options={[['anomaly', 'Anomaly'], ['raw', 'Values as stored']]} />
          <BasePeriod f={f} path={['base']} />
        </>
      );
    case 'scatter':
      return (
        <>
          <Binding f={f} path={['index']} label="Climate index (x)" />
          <Binding f={f} path={['series']} label="Carbon series (y)" />
          <NumberField f={f} path={['lag']} label="Index leads by (months; negative: lags)" min={-FIGURE_LIMITS.maxLag} max={FIGURE_LIMITS.maxLag} />
          <AnomalyFields f={f} />
        </>
      );
  }
}

/**
 * The settings of one figure: what it shows, from which series and versions,
 * and the parameters of that kind. Saving validates with the shared recipe
 * schema and hands the parsed recipe (defaults filled in) to onSave.
 */
export function RecipeForm({
  initial,
  series,
  seriesLoading,
  onSave,
  onCancel,
  saveLabel = 'Save figure settings',
}: {
  initial: Record<string, unknown> | null;
  series: SeriesSummary[];
  seriesLoading?: boolean;
  onSave: (recipe: ParsedFigureRecipe) => void;
  onCancel?: () => void;
  saveLabel?: string;
}) {
  const [draft, setDraft] = useState<RecipeDraft>(() => draftFromRecipe(initial));
  const [issues, setIssues] = useState<Issues>([]);
  const kindId = useId();
  const f: FormApi = useMemo(
    () => ({
      draft,
      series,
      set: (path, value) => {
        setDraft((d) => setAt(d, path, value));
        setIssues((all) => all.filter((i) => !starts(i.path, path) && !starts(path, i.path)));
      },
      error: (path) => {
        const own = issues.filter((i) => starts(i.path, path)).map((i) => i.message);
        return own.length ? [...new Set(own)].join('; ') : undefined;
      },
      exactError: (path) => {
        const own = issues.filter((i) => i.path.length === path.length && starts(i.path, path)).map((i) => i.message);
        return own.length ? [...new Set(own)].join('; ') : undefined;
      },
    }),
    [draft, issues, series],
  );

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = figureRecipeSchema.safeParse(draft);
    if (!parsed.success) {
      setIssues(parsed.error.issues.map((i) => ({ path: i.path as Path, message: i.message })));
      return;
    }
    setIssues([]);
    onSave(parsed.data);
  };

  return (
    <form className="upwell-recipe-form" onSubmit={submit} noValidate aria-label="Figure settings">
      <div className="upwell-field">
        <label htmlFor={kindId}>What the figure shows</label>
        <select id={kindId} value={draft.kind} onChange={(e) => { setDraft((d) => changeKind(d, e.target.value as FigureKind)); setIssues([]); }}>
          {(Object.keys(FIGURE_KIND_LABELS) as FigureKind[]).map((k) => (
            <option key={k} value={k}>
              {FIGURE_KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </div>
      {seriesLoading && <Text size="1" color="gray">Loading the group’s series library…</Text>}
      {!seriesLoading && series.length === 0 && draft.kind !== 'hovmoller' && (
        <Text size="1" color="gray" as="p">
          The group’s library has no series yet. Add one in the Series library, then come back to bind it here.
        </Text>
      )}
      <KindFields f={f} />
      {issues.length > 0 && (
        <Text size="1" color="red" as="p" role="alert">
          {issues.length === 1 ? 'One field needs attention' : `${issues.length} fields need attention`}; see the notes beside them.
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
  );
}
