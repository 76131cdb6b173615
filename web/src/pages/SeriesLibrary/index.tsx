import { Badge, Button, Flex, Link, Select, Spinner, Table, Text, TextField } from '@radix-ui/themes';
import { useDeferredValue, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { SERIES_KIND_LABELS, SERIES_KINDS, type ListSeriesQuery, type SeriesKind } from '@upwell/common';
import { useSeriesList } from '../../api/series';
import { useCurrentGroup } from '../../current-group';
import { EmptyState } from '../../components/EmptyState';
import { ErrorNote } from '../../components/ErrorNote';
import { TableCaption } from '../../components/TableCaption';
import { PageTitle } from '../../components/PageTitle';
import { Sparkline } from '../../components/Sparkline';
import { formatWhen } from '../../components/dates';
import { useSeriesLiveRefresh } from '../../realtime/socket';
import { UploadDialog } from './UploadDialog';

type Sort = ListSeriesQuery['sort'];
const PAGE_SIZE = 25;

function SortHeader({ label, column, sort, order, onSort }: { label: string; column: Sort; sort: Sort; order: 'asc' | 'desc'; onSort: (c: Sort) => void }) {
  const active = sort === column;
  return (
    <Table.ColumnHeaderCell aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <Button variant="ghost" color="gray" size="1" onClick={() => onSort(column)}>
        {label} {active ? (order === 'asc' ? '▲' : '▼') : ''}
      </Button>
    </Table.ColumnHeaderCell>
  );
}

/** The group's stored series: a filterable, sortable, paged table with a sparkline per series. */
export default function SeriesLibraryPage() {
  const { group } = useCurrentGroup();
  useSeriesLiveRefresh();
  const [q, setQ] = useState('');
  const [kind, setKind] = useState<SeriesKind | 'all'>('all');
  const [sort, setSort] = useState<Sort>('name');
  const [order, setOrder] = useState<'asc' | 'desc'>('asc');
  const [page, setPage] = useState(1);
  const query = useDeferredValue(q.trim());
  const list = useSeriesList(group?.id, { q: query, kind: kind === 'all' ? undefined : kind, sort, order, page, pageSize: PAGE_SIZE });

  if (!group) {
    return (
      <>
        <PageTitle title="Series library" />
        <EmptyState title="Series belong to a research group">Create or join a group on the Group page; its series library starts empty.</EmptyState>
      </>
    );
  }
  const onSort = (c: Sort) => {
    if (c === sort) setOrder(order === 'asc' ? 'desc' : 'asc');
    else (setSort(c), setOrder(c === 'updated' ? 'desc' : 'asc'));
    setPage(1);
  };
  const data = list.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1;
  const filtered = !!query || kind !== 'all';

  return (
    <>
      <PageTitle title="Series library" subtitle={`${group.name} · climate indices and carbon series, each with its versions`} actions={<UploadDialog groupId={group.id} />} />
      <Flex gap="3" mb="3" align="center" wrap="wrap">
        <TextField.Root type="search" aria-label="Search series" placeholder="Search name, variable, region, source" value={q} onChange={(e) => (setQ(e.target.value), setPage(1))} style={{ minWidth: 300 }} />
        <Select.Root value={kind} onValueChange={(v) => (setKind(v as SeriesKind | 'all'), setPage(1))}>
          <Select.Trigger aria-label="Kind of series" />
          <Select.Content>
            <Select.Item value="all">All kinds</Select.Item>
            {SERIES_KINDS.map((k) => (
              <Select.Item key={k} value={k}>
                {SERIES_KIND_LABELS[k]}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
        {list.isFetching && <Spinner />}
      </Flex>
      <ErrorNote error={list.error} action="Reload the page to try again." />
      {data && data.total === 0 ? (
        filtered ? (
          <EmptyState title="No series match">Nothing in the library matches these filters. Clear the search or choose “All kinds”.</EmptyState>
        ) : (
          <EmptyState title="No series stored yet" action={<UploadDialog groupId={group.id} />}>
            Upload a CSV table (a date column with value columns, or a year column with twelve month columns) or a NetCDF file with a
            time axis. Each column or variable becomes a series; uploading it again later adds a new version and keeps the old one.
          </EmptyState>
        )
      ) : (
        data && (
          <>
            <Table.Root variant="surface" className="upwell-numbers">
<TableCaption>Series</TableCaption>
              <Table.Header>
                <Table.Row>
                  <SortHeader label="Name" column="name" sort={sort} order={order} onSort={onSort} />
                  <SortHeader label="Kind" column="kind" sort={sort} order={order} onSort={onSort} />
                  <Table.ColumnHeaderCell>Shape</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Units</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Months</Table.ColumnHeaderCell>
                  <SortHeader label="Latest version" column="updated" sort={sort} order={order} onSort={onSort} />
                </Table.Row>
              </Table.Header>
              <Table.Body>
                {data.items.map((s) => (
                  <Table.Row key={s.id}>
                    <Table.RowHeaderCell>
                      <Link asChild weight="bold">
                        <RouterLink to={`/series/${s.id}`}>{s.name}</RouterLink>
                      </Link>
                      {s.origin === 'model-output' && (
                        <Badge ml="2" color="amber" variant="soft" size="1">
                          model output
                        </Badge>
                      )}
                      {s.region && (
                        <Text as="div" size="1" color="gray">
                          {s.region}
                          {s.depthLayer ? ` · ${s.depthLayer}` : ''}
                        </Text>
                      )}
                    </Table.RowHeaderCell>
                    <Table.Cell>{SERIES_KIND_LABELS[s.kind]}</Table.Cell>
                    <Table.Cell>
                      <Sparkline values={s.sparkline} />
                    </Table.Cell>
                    <Table.Cell className="upwell-mono">{s.units || '—'}</Table.Cell>
                    <Table.Cell className="upwell-mono">{s.latest ? `${s.latest.start} – ${s.latest.end}` : '—'}</Table.Cell>
                    <Table.Cell>{s.latest ? `v${s.latest.number} · ${formatWhen(s.latest.createdAt)}` : 'no values'}</Table.Cell>
                  </Table.Row>
                ))}
              </Table.Body>
            </Table.Root>
            <Flex justify="between" align="center" mt="3">
              <Text size="2" color="gray">
                {data.total} series · page {page} of {pages}
              </Text>
              <Flex gap="2">
                <Button variant="soft" disabled={page <= 1} onClick={() => setPage(page - 1)}>
                  Previous page
                </Button>
                <Button variant="soft" disabled={page >= pages} onClick={() => setPage(page + 1)}>
                  Next page
                </Button>
              </Flex>
            </Flex>
          </>
        )
      )}
    </>
  );
}
