import { Button, Flex, Grid, Select, Text, TextArea, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { DATA_ORIGINS, SERIES_KIND_LABELS, SERIES_KINDS, SERIES_LIMITS, type DataOrigin, type SeriesDetail, type SeriesKind } from '@upwell/common';
import { useUpdateSeries } from '../../api/series';
import { ErrorNote } from '../../components/ErrorNote';

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
          <Select.Root value={form.kind} onValueChange={(v) => setForm({ ...form, kind: v as SeriesKind })}>
            <Select.Trigger aria-label="Kind" style={{ width: '100%' }} />
            <Select.Content>
              {SERIES_KINDS.map((k) => (
                <Select.Item key={k} value={k}>
                  {SERIES_KIND_LABELS[k]}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
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
          <Select.Root value={form.origin} onValueChange={(v) => setForm({ ...form, origin: v as DataOrigin })}>
            <Select.Trigger aria-label="Origin" style={{ width: '100%' }} />
            <Select.Content>
              {DATA_ORIGINS.map((o) => (
                <Select.Item key={o} value={o}>
                  {ORIGIN_LABELS[o]}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
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
