import { Button, Flex, Grid, Text, TextArea, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { DATA_ORIGINS, SERIES_KIND_LABELS, SERIES_KINDS, SERIES_LIMITS, type DataOrigin, type SeriesDetail } from '@upwell/common';
import { useUpdateSeries } from '../../api/series';
import { ErrorNote } from '../../components/ErrorNote';
import { EnumSelect } from '../../components/EnumSelect';

export const ORIGIN_LABELS: Record<DataOrigin, string> = {
  'model-output': 'Model output',
  observation: 'Observation',
  reanalysis: 'Reanalysis',
  derived: 'Derived',
  unspecified: 'Not stated',
};

/** The describing fields of a series, editable by group members. */
export function MetadataForm({ series }: { series: SeriesDetail }) {
  const update = useUpdateSeries(series.id);
  const [form, setForm] = useState({
    name: series.name,
    kind: series.kind,
    variable: series.variable,
    units: series.units,
    region: series.region,
    depthLayer: series.depthLayer,
    source: series.source,
    origin: series.origin,
    notes: series.notes,
  });
  const text = (k: 'name' | 'variable' | 'units' | 'region' | 'depthLayer' | 'source', label: string) => (
    <label>
      <Text as="div" size="2" weight="bold" mb="1">
        {label}
      </Text>
      <TextField.Root value={form[k]} maxLength={k === 'name' ? SERIES_LIMITS.nameMax : SERIES_LIMITS.textMax} onChange={(e) => setForm({ ...form, [k]: e.target.value })} />
    </label>
  );
  async function submit(e: FormEvent) {
    e.preventDefault();
    await update.mutateAsync(form).catch(() => {});
  }
  return (
    <form onSubmit={submit} aria-label="Series metadata">
      <Grid columns={{ initial: '1', sm: '2' }} gap="3">
        {text('name', 'Name')}
        <label>
          <Text as="div" size="2" weight="bold" mb="1">
            Kind
          </Text>
          <EnumSelect label="Kind" value={form.kind} values={SERIES_KINDS} labels={SERIES_KIND_LABELS} onChange={(kind) => setForm({ ...form, kind })} style={{ width: '100%' }} />
        </label>
        {text('variable', 'Variable')}
        {text('units', 'Units')}
        {text('region', 'Region')}
        {text('depthLayer', 'Depth layer')}
        {text('source', 'Source')}
        <label>
          <Text as="div" size="2" weight="bold" mb="1">
            Origin
          </Text>
          <EnumSelect label="Origin" value={form.origin} values={DATA_ORIGINS} labels={ORIGIN_LABELS} onChange={(origin) => setForm({ ...form, origin })} style={{ width: '100%' }} />
        </label>
      </Grid>
      <label>
        <Text as="div" size="2" weight="bold" mb="1" mt="3">
          Notes
        </Text>
        <TextArea value={form.notes} maxLength={SERIES_LIMITS.notesMax} onChange={(e) => setForm({ ...form, notes: e.target.value })} />
      </label>
      <Flex gap="3" mt="3" align="center">
        <Button type="submit" loading={update.isPending}>
          Save metadata
        </Button>
        {update.isSuccess && (
          <Text size="2" color="green" role="status">
            Saved.
          </Text>
        )}
      </Flex>
      <ErrorNote error={update.error} />
    </form>
  );
}
