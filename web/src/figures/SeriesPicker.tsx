import type { SeriesSummary } from '@upwell/common';
import { useId } from 'react';
import { FieldError } from './FieldError';

/** A binding as the form holds it. */
export interface BindingDraft {
  seriesId: string;
  version?: 'latest' | number;
}

/**
 * Chooses a stored series and whether the figure follows its latest version
 * or stays on one version. Shows each series' latest version number.
 */
export function SeriesPicker({
  label,
  value,
  onChange,
  series,
  error,
  noneLabel,
}: {
  label: string;
  value: BindingDraft | undefined;
  onChange: (b: BindingDraft | undefined) => void;
  series: SeriesSummary[];
  error?: string;
  /** When given, the series may be left unbound, and this says what happens then. */
  noneLabel?: string;
}) {
  const id = useId();
  const chosen = series.find((s) => s.id === value?.seriesId);
  const latest = chosen?.latest?.number ?? null;
  const version = value?.version ?? 'latest';
  return (
    <div className="upwell-field upwell-series-picker">
      <label htmlFor={`${id}-s`}>{label}</label>
      <div className="upwell-field-row">
        <select
          id={`${id}-s`}
          value={value?.seriesId ?? ''}
          aria-invalid={!!error || undefined}
          aria-describedby={error ? `${id}-e` : undefined}
          onChange={(e) => onChange(e.target.value ? { seriesId: e.target.value, version: 'latest' } : noneLabel ? undefined : { seriesId: '', version: 'latest' })}
        >
          <option value="">{noneLabel ?? 'Choose a series…'}</option>
          {series.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
              {s.units ? ` (${s.units})` : ''}
              {s.latest ? ` · v${s.latest.number}` : ' · no version yet'}
            </option>
          ))}
        </select>
        <select
          aria-label={`Version of ${label.toLowerCase()}`}
          value={String(version)}
          disabled={!value?.seriesId}
          onChange={(e) => onChange({ seriesId: value?.seriesId ?? '', version: e.target.value === 'latest' ? 'latest' : Number(e.target.value) })}
        >
          <option value="latest">{latest ? `Latest (now v${latest})` : 'Latest'}</option>
          {Array.from({ length: latest ?? 0 }, (_, i) => latest! - i).map((n) => (
            <option key={n} value={n}>
              Pinned to v{n}
            </option>
          ))}
          {typeof version === 'number' && (latest === null || version > latest) && <option value={version}>Pinned to v{version}</option>}
        </select>
      </div>
      <FieldError id={`${id}-e`} message={error} />
    </div>
  );
}
