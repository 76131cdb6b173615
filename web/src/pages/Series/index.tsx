import { Badge, Box, Button, Callout, Flex, Heading, Spinner, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { SERIES_KIND_LABELS } from '@upwell/common';
import { downloadFile } from '../../api/download';
import { useDeleteSeries, useSeries, useSeriesUsage, useSeriesValues } from '../../api/series';
import { LazyVegaFigure } from '../../charts/LazyVegaFigure';
import { seriesLineSpec } from '../../charts/series-spec';
import { useCurrentGroup } from '../../current-group';
import { ConfirmDelete } from '../../components/ConfirmDelete';
import { ErrorNote } from '../../components/ErrorNote';
import { formatWhen } from '../../components/dates';
import { useSeriesLiveRefresh } from '../../realtime/socket';
import { MetadataForm, ORIGIN_LABELS } from './MetadataForm';

/** One stored series: chart, metadata, versions with provenance, download, delete. */
export default function SeriesPage() {
  const { seriesId = '' } = useParams();
  useSeriesLiveRefresh();
  const series = useSeries(seriesId);
  const [shown, setShown] = useState<number | 'latest'>('latest');
  const values = useSeriesValues(seriesId, shown);
  const remove = useDeleteSeries(seriesId);
  const { group } = useCurrentGroup();
  const navigate = useNavigate();
  const [downloadError, setDownloadError] = useState<unknown>(null);
  const usage = useSeriesUsage(seriesId, !!series.data && !!group?.allowed.includes('delete-series'));

  if (series.error) return <ErrorNote error={series.error} action="Go back to the series library." />;
  if (!series.data) return <Spinner size="3" />;
  const s = series.data;
  const mayDelete = group?.id === s.groupId && group.allowed.includes('delete-series');
  const usedBy = usage.data
    ? [...usage.data.notebooks.map((n) => `“${n.title}”`), ...(usage.data.otherNotebooks ? [`${usage.data.otherNotebooks} notebook(s) you have no role on`] : [])]
    : [];

  return (
    <Flex direction="column" gap="5">
      <div>
        <Heading as="h1" size="7">
          {s.name}
        </Heading>
        <Flex gap="2" mt="2" wrap="wrap" align="center">
          <Badge variant="soft">{SERIES_KIND_LABELS[s.kind]}</Badge>
          <Badge variant="soft" color={s.origin === 'model-output' ? 'amber' : 'gray'}>
            {ORIGIN_LABELS[s.origin]}
          </Badge>
          <Text size="2" color="gray">
            {[s.variable, s.units, s.region, s.depthLayer, s.source].filter(Boolean).join(' · ')}
          </Text>
        </Flex>
        {s.origin === 'model-output' && (
          <Callout.Root color="amber" variant="surface" mt="3" size="1">
            <Callout.Text>These values are model output, not observations.</Callout.Text>
          </Callout.Root>
        )}
      </div>
      <Box className="upwell-sheet" p="4">
        {values.data ? (
          <LazyVegaFigure spec={seriesLineSpec(values.data.start, values.data.values, s.units, s.variable || s.name)} label={`${s.name}, version ${values.data.version}, over time`} />
        ) : values.error ? (
          <ErrorNote error={values.error} />
        ) : (
          <Spinner />
        )}
        {values.data && (
          <Text as="p" size="1" color="gray" mt="2">
            Version {values.data.version} · {values.data.values.length} months from {values.data.start}
          </Text>
        )}
      </Box>
      <section aria-labelledby="versions-heading">
        <Heading as="h2" size="4" id="versions-heading" mb="2">
          Versions
        </Heading>
        <ErrorNote error={downloadError} />
        <Table.Root variant="surface" size="1" className="upwell-numbers">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Version</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Months</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Missing</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>From file</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Values sha256</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Added</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell />
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {s.versions.map((v) => (
              <Table.Row key={v.number}>
                <Table.RowHeaderCell>
                  <Button variant={shown === v.number || (shown === 'latest' && v.number === s.latest?.number) ? 'soft' : 'ghost'} size="1" onClick={() => setShown(v.number)} aria-label={`Show version ${v.number}`}>
                    v{v.number}
                  </Button>
                </Table.RowHeaderCell>
                <Table.Cell className="upwell-mono">
                  {v.start} – {v.end}
                </Table.Cell>
                <Table.Cell>{v.missing}</Table.Cell>
                <Table.Cell>
                  {v.file ? (
                    <span title={`sha256 ${v.file.sha256}`}>
                      {v.file.name}
                      {v.transform?.type === 'csv-column' && ` (column “${v.transform.column}”)`}
                      {v.transform?.type === 'netcdf-variable' && ` (variable “${v.transform.variable}”)`}
                      {v.transform?.type === 'regional-budget' && <span title={v.transform.description}>{` (regional budget: ${v.transform.region}, ${v.transform.depth})`}</span>}
                    </span>
                  ) : (
                    v.transform?.type === 'grid-reduction' ? v.transform.description : '—'
                  )}
                </Table.Cell>
                <Table.Cell className="upwell-mono" title={v.valuesSha256}>
                  {v.valuesSha256.slice(0, 12)}…
                </Table.Cell>
                <Table.Cell>
                  {v.createdBy.name}, {formatWhen(v.createdAt)}
                </Table.Cell>
                <Table.Cell>
                  <Button size="1" variant="ghost" onClick={() => downloadFile(`/series/${s.id}/versions/${v.number}/csv`, `series-v${v.number}.csv`).catch(setDownloadError)}>
                    Download CSV
                  </Button>
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      </section>
      <section aria-labelledby="metadata-heading">
        <Heading as="h2" size="4" id="metadata-heading" mb="2">
          Description
        </Heading>
        <MetadataForm key={s.updatedAt} series={s} />
      </section>
      {mayDelete && (
        <ConfirmDelete
          label="Delete series"
          title={`Delete “${s.name}” and its ${s.versions.length} versions?`}
          description={`${usedBy.length ? `Figures and live numbers in ${usedBy.join(', ')} use this series and will show an error. ` : ''}The values of every version are removed for good. Uploaded files stay in the data folder.`}
          onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate('/series') })}
        />
      )}
      <ErrorNote error={remove.error} />
    </Flex>
  );
}
