import { Box, Button, Callout, Checkbox, Flex, Heading, ScrollArea, Select, Table, Text, TextField } from '@radix-ui/themes';
import { useState } from 'react';
import {
  DATA_ORIGINS,
  SERIES_KIND_LABELS,
  SERIES_KINDS,
  type SeriesImportMappingInput,
  type DataOrigin,
  type SeriesKind,
  type UploadPreview,
} from '@upwell/common';
import { useSeriesList } from '../../api/series';
import { useImportUpload } from '../../api/uploads';
import { ErrorNote } from '../../components/ErrorNote';
import { EnumSelect } from '../../components/EnumSelect';
import { TableCaption } from '../../components/TableCaption';
import { ORIGIN_LABELS } from '../Series/MetadataForm';

interface Row {
  column: string;
  include: boolean;
  name: string;
  kind: SeriesKind;
  variable: string;
  units: string;
  region: string;
  source: string;
  /** An existing series to add this column to as a new version, or '' for a new series. */
  target: string;
  months: string;
}

function rowsFrom(preview: UploadPreview): Row[] {
  if (preview.csv) {
    return preview.csv.series.map((s) => ({
      column: s.column,
      include: true,
      name: s.suggestedName,
      kind: 'other',
      variable: s.column === '(months)' ? 'value' : s.column,
      units: s.suggestedUnits ?? '',
      region: '',
      source: preview.fileName,
      target: '',
      months: `${s.start} · ${s.values.length} months · ${s.missingCount} missing`,
    }));
  }
  return (preview.netcdf?.variables ?? [])
    .filter((v) => v.use === 'series')
    .map((v) => ({
      column: v.name,
      include: true,
      name: v.longName || v.name,
      kind: 'other',
      variable: v.name,
      units: v.units,
      region: '',
      source: preview.fileName,
      target: '',
      months: `${v.start} · ${v.months} months · ${v.missing} missing`,
    }));
}

/** The preview of an upload and the form that says which columns become which series. */
export function ImportMapping({ groupId, preview, onDone, onDiscard }: { groupId: string; preview: UploadPreview; onDone: (message: string) => void; onDiscard: () => void }) {
  const [rows, setRows] = useState<Row[]>(() => rowsFrom(preview));
  const [origin, setOrigin] = useState<DataOrigin>('unspecified');
  const existing = useSeriesList(groupId, { pageSize: 200, sort: 'name' });
  const importer = useImportUpload(preview.uploadId);
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const csv = preview.csv;
  const grids = preview.netcdf?.variables.filter((v) => v.use === 'grid') ?? [];
  const unusable = preview.netcdf?.variables.filter((v) => v.use === 'unusable') ?? [];
  const [keepGrids, setKeepGrids] = useState<Record<string, boolean>>({});

  async function submit() {
    const columns: SeriesImportMappingInput['columns'] = rows.map((r) =>
      r.include ? { column: r.column, skip: false, name: r.name, kind: r.kind, variable: r.variable || r.column, units: r.units, region: r.region, source: r.source } : { column: r.column, skip: true },
    );
    const targets = Object.fromEntries(rows.filter((r) => r.include && r.target).map((r) => [r.column, r.target]));
    const res = await importer.mutateAsync({ origin, columns, targets, grids: grids.filter((g) => keepGrids[g.name]).map((g) => ({ variable: g.name, name: g.longName || g.name })) }).catch(() => null);
    if (!res) return;
    const made = res.series.filter((s) => s.created);
    const same = res.series.filter((s) => !s.created);
    onDone(
      [
        made.length ? `Stored ${made.map((s) => `${s.name} (version ${s.version})`).join(', ')}.` : '',
        same.length ? `${same.map((s) => s.name).join(', ')} had the same values as its latest version, so no new version was made.` : '',
        res.fields.length ? `Kept ${res.fields.length} gridded field(s) for regional and zonal means.` : '',
      ].join(' '),
    );
  }

  return (
    <Flex direction="column" gap="4">
      <Text size="2" color="gray">
        {preview.fileName} · {(preview.size / 1024).toFixed(1)} kB ·{' '}
        {csv
          ? `${csv.layout.kind === 'wide' ? 'year × 12 months table' : 'dated rows'}, ${csv.delimiter}-separated, ${csv.rowCount} rows${csv.linesBeforeHeader ? `, ${csv.linesBeforeHeader} lines skipped before the header` : ''}`
          : `NetCDF (${preview.format === 'netcdf4' ? 'NetCDF-4/HDF5' : 'classic'})${preview.netcdf?.calendar ? `, ${preview.netcdf.calendar} calendar` : ''}`}
      </Text>
      {csv && csv.warnings.length > 0 && (
        <Callout.Root color="amber" size="1">
          <Callout.Text>
            {csv.warnings.map((w, i) => (
              <span key={i} style={{ display: 'block' }}>
                {w.message}
              </span>
            ))}
          </Callout.Text>
        </Callout.Root>
      )}
      {csv && (
        <Box>
          <Heading as="h3" size="2" mb="1">
            As read from the file (first {csv.rows.length} rows)
          </Heading>
          <ScrollArea scrollbars="both" style={{ maxHeight: 200 }}>
            <Table.Root size="1" variant="surface" className="upwell-mono">
<TableCaption>Rows as read</TableCaption>
              <Table.Header>
                <Table.Row>
                  {csv.header.map((h) => (
                    <Table.ColumnHeaderCell key={h}>{h}</Table.ColumnHeaderCell>
                  ))}
                </Table.Row>
              </Table.Header>
              <Table.Body>
                {csv.rows.map((r, i) => (
                  <Table.Row key={i}>
                    {r.map((c, j) => (
                      <Table.Cell key={j}>{c}</Table.Cell>
                    ))}
                  </Table.Row>
                ))}
              </Table.Body>
            </Table.Root>
          </ScrollArea>
        </Box>
      )}
      {unusable.length > 0 && (
        <Text size="1" color="gray">
          Not importable: {unusable.map((v) => `${v.name} (${v.reason})`).join('; ')}
        </Text>
      )}
      <Box>
        <Heading as="h3" size="2" mb="1">
          Series to store
        </Heading>
        <ScrollArea scrollbars="horizontal">
          <Table.Root size="1">
<TableCaption>Series to store</TableCaption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Store</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Column</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Kind</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Variable</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Units</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Region</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>As</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {rows.map((r, i) => (
                <Table.Row key={r.column}>
                  <Table.Cell>
                    <Checkbox checked={r.include} onCheckedChange={(c) => set(i, { include: c === true })} aria-label={`Store column ${r.column}`} />
                  </Table.Cell>
                  <Table.RowHeaderCell>
                    <Text weight="bold">{r.column}</Text>
                    <Text as="div" size="1" color="gray">
                      {r.months}
                    </Text>
                  </Table.RowHeaderCell>
                  <Table.Cell>
                    <TextField.Root size="1" aria-label={`Name for ${r.column}`} value={r.name} onChange={(e) => set(i, { name: e.target.value })} />
                  </Table.Cell>
                  <Table.Cell>
                    <EnumSelect size="1" label={`Kind for ${r.column}`} value={r.kind} values={SERIES_KINDS} labels={SERIES_KIND_LABELS} onChange={(kind) => set(i, { kind })} />
                  </Table.Cell>
                  <Table.Cell>
                    <TextField.Root size="1" aria-label={`Variable for ${r.column}`} value={r.variable} onChange={(e) => set(i, { variable: e.target.value })} />
                  </Table.Cell>
                  <Table.Cell>
                    <TextField.Root size="1" aria-label={`Units for ${r.column}`} value={r.units} onChange={(e) => set(i, { units: e.target.value })} style={{ width: 90 }} />
                  </Table.Cell>
                  <Table.Cell>
                    <TextField.Root size="1" aria-label={`Region for ${r.column}`} value={r.region} onChange={(e) => set(i, { region: e.target.value })} />
                  </Table.Cell>
                  <Table.Cell>
                    <Select.Root size="1" value={r.target || 'new'} onValueChange={(v) => set(i, { target: v === 'new' ? '' : v })}>
                      <Select.Trigger aria-label={`Store ${r.column} as`} />
                      <Select.Content>
                        <Select.Item value="new">a new series</Select.Item>
                        {(existing.data?.items ?? []).map((s) => (
                          <Select.Item key={s.id} value={s.id}>
                            new version of {s.name}
                          </Select.Item>
                        ))}
                      </Select.Content>
                    </Select.Root>
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        </ScrollArea>
      </Box>
      {grids.length > 0 && (
        <Box>
          <Heading as="h3" size="2" mb="1">
            Gridded variables
          </Heading>
          {grids.map((g) => (
            <Text as="label" size="2" key={g.name} style={{ display: 'flex', gap: 8, alignItems: 'center' }}>
              <Checkbox checked={!!keepGrids[g.name]} onCheckedChange={(c) => setKeepGrids({ ...keepGrids, [g.name]: c === true })} />
              Keep {g.name} ({g.dims.join(' × ')}, {g.units}) for regional and zonal means
            </Text>
          ))}
        </Box>
      )}
      <Flex gap="3" align="center" wrap="wrap">
        <Text size="2" weight="bold">
          These numbers are
        </Text>
        <EnumSelect label="Origin of the data" value={origin} values={DATA_ORIGINS} labels={ORIGIN_LABELS} onChange={setOrigin} />
      </Flex>
      <ErrorNote error={importer.error} />
      <Flex gap="2" justify="end">
        <Button variant="soft" color="gray" onClick={onDiscard}>
          Discard upload
        </Button>
        <Button onClick={submit} loading={importer.isPending} disabled={!rows.some((r) => r.include) && !Object.values(keepGrids).some(Boolean)}>
          Store selected series
        </Button>
      </Flex>
    </Flex>
  );
}
