import { Button, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import type { SnapshotView } from '@upwell/common';
import { useSnapshots } from '../../api/snapshots';
import { ErrorNote } from '../../components/ErrorNote';
import { TableCaption } from '../../components/TableCaption';
import { formatWhen } from '../../components/dates';
import { CompareChooser } from '../Compare/CompareChooser';
import { PublishSnapshotDialog } from './PublishSnapshotDialog';
import { ShareLinksPanel } from './ShareLinksPanel';

/**
 * The notebook's published snapshots: the list everyone with a role reads;
 * for the lead author also publishing and share links; comparing for all.
 */
export function SnapshotsPanel({ notebookId, canPublish }: { notebookId: string; canPublish: boolean }) {
  const snapshots = useSnapshots(notebookId);
  const navigate = useNavigate();
  const [sharing, setSharing] = useState<string | null>(null);
  const [published, setPublished] = useState<SnapshotView | null>(null);
  const rows = snapshots.data ?? [];
  const nextNumber = (rows[0]?.number ?? 0) + 1;
  const sharingRow = rows.find((s) => s.id === sharing);
  return (
    <section aria-labelledby="snapshots-heading">
      <Flex justify="between" align="center" mb="2" gap="3" wrap="wrap">
        <Heading as="h2" size="4" id="snapshots-heading">
          Snapshots
        </Heading>
        {canPublish && <PublishSnapshotDialog notebookId={notebookId} nextNumber={nextNumber} onPublished={setPublished} />}
      </Flex>
      <Text as="p" size="2" color="gray" mb="3">
        A snapshot is a numbered, read-only edition of the notebook: text, figures and numbers frozen with the data versions they were computed
        from. {canPublish ? 'You publish them as lead author.' : 'The lead author publishes them.'}
      </Text>
      {published && (
        <Text as="p" size="2" role="status" mb="2">
          Snapshot v{published.number} is published. <Link to={`/snapshots/${published.id}`}>Open snapshot v{published.number}</Link>
        </Text>
      )}
      <ErrorNote error={snapshots.error} />
      {rows.length === 0 ? (
        <Text size="2" color="gray">
          {snapshots.isPending ? 'Loading snapshots…' : canPublish ? 'No snapshots yet. Publish one when the notebook is ready for readers.' : 'No snapshots yet.'}
        </Text>
      ) : (
        <Flex direction="column" gap="4">
          <Table.Root size="1" variant="surface">
            <TableCaption>Snapshots</TableCaption>
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Snapshot</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Published</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Contents</Table.ColumnHeaderCell>
                {canPublish && <Table.ColumnHeaderCell />}
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {rows.map((s) => (
                <Table.Row key={s.id}>
                  <Table.RowHeaderCell>
                    <Link to={`/snapshots/${s.id}`}>
                      v{s.number} — {s.title}
                    </Link>
                  </Table.RowHeaderCell>
                  <Table.Cell>
                    {formatWhen(s.publishedAt)} by {s.publishedBy?.name ?? 'a former member'}
                  </Table.Cell>
                  <Table.Cell>
                    {s.figureCount} {s.figureCount === 1 ? 'figure' : 'figures'}, {s.numberCount} {s.numberCount === 1 ? 'number' : 'numbers'}
                  </Table.Cell>
                  {canPublish && (
                    <Table.Cell>
                      <Button size="1" variant="soft" aria-expanded={sharing === s.id} onClick={() => setSharing((id) => (id === s.id ? null : s.id))} aria-label={`Share links of v${s.number}`}>
                        Share links
                      </Button>
                    </Table.Cell>
                  )}
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
          {canPublish && sharingRow && <ShareLinksPanel key={sharingRow.id} snapshot={sharingRow} />}
          <div>
            <Heading as="h3" size="3" mb="2">
              Compare versions
            </Heading>
            <CompareChooser snapshots={rows} onCompare={(from, to) => navigate(`/notebooks/${notebookId}/compare?from=${from}&to=${to}`)} />
          </div>
        </Flex>
      )}
    </section>
  );
}
