import { Badge, Flex, Link, SegmentedControl, Spinner, Table, TextField } from '@radix-ui/themes';
import { useDeferredValue, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { NOTEBOOK_ROLE_LABELS } from '@upwell/common';
import { useNotebooks } from '../../api/notebooks';
import { useCurrentGroup } from '../../current-group';
import { CreateGroupForm } from '../../components/CreateGroupForm';
import { EmptyState } from '../../components/EmptyState';
import { ErrorNote } from '../../components/ErrorNote';
import { PageTitle } from '../../components/PageTitle';
import { formatWhen } from '../../components/dates';
import { NewNotebookDialog } from './NewNotebookDialog';
import { ImportNotebookFile } from './ImportNotebookFile';

/** The group's notebooks that the person holds a role on. */
export default function NotebooksPage() {
  const { group } = useCurrentGroup();
  const [q, setQ] = useState('');
  const [shelf, setShelf] = useState<'current' | 'archived'>('current');
  const query = useDeferredValue(q.trim());
  const notebooks = useNotebooks(group?.id, query, shelf === 'archived');

  if (!group) {
    return (
      <>
        <PageTitle title="Notebooks" />
        <EmptyState title="Start by creating your research group" action={<CreateGroupForm />}>
          Notebooks, series and people belong to a research group. Create one for your team; you will be its admin and can add
          co-authors, reviewers and readers.
        </EmptyState>
      </>
    );
  }

  const rows = notebooks.data ?? [];
  return (
    <>
      <PageTitle title="Notebooks" subtitle={group.name} actions={
          <Flex gap="3" align="start">
            <ImportNotebookFile groupId={group.id} />
            <NewNotebookDialog groupId={group.id} />
          </Flex>
        }
      />
      <Flex gap="3" mb="3" align="center" wrap="wrap">
        <TextField.Root
          type="search"
          aria-label="Search notebooks"
          placeholder="Search titles and descriptions"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          style={{ minWidth: 320 }}
        />
        <SegmentedControl.Root value={shelf} onValueChange={(v) => setShelf(v as 'current' | 'archived')} aria-label="Which notebooks">
          <SegmentedControl.Item value="current">In progress</SegmentedControl.Item>
          <SegmentedControl.Item value="archived">Archived</SegmentedControl.Item>
        </SegmentedControl.Root>
        {notebooks.isFetching && <Spinner />}
      </Flex>
      <ErrorNote error={notebooks.error} action="Reload the page to try again." />
      {notebooks.isSuccess && rows.length === 0 ? (
        query ? (
          <EmptyState title="No notebook matches">Nothing in {group.name} matches “{query}”. Try fewer or other words.</EmptyState>
        ) : shelf === 'archived' ? (
          <EmptyState title="Nothing archived">Archived notebooks wait here; a lead author can archive a finished analysis.</EmptyState>
        ) : (
          <EmptyState title="No notebooks yet">
            A notebook holds one event analysis: anomalies, events, lagged correlations and budget figures, with the text around them.
            Start one with “New notebook”; you will be its lead author and can invite co-authors, reviewers and readers.
          </EmptyState>
        )
      ) : (
        rows.length > 0 && (
          <Table.Root variant="surface" className="upwell-numbers">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Title</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Lead author</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Last edit</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Your role</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {rows.map((nb) => (
                <Table.Row key={nb.id}>
                  <Table.RowHeaderCell>
                    <Link asChild weight="bold">
                      <RouterLink to={`/notebooks/${nb.id}`}>{nb.title}</RouterLink>
                    </Link>
                  </Table.RowHeaderCell>
                  <Table.Cell>{nb.owner.name}</Table.Cell>
                  <Table.Cell>{formatWhen(nb.updatedAt)}</Table.Cell>
                  <Table.Cell>
                    <Badge variant="soft" color={nb.myRole === 'lead-author' ? 'teal' : 'gray'}>
                      {NOTEBOOK_ROLE_LABELS[nb.myRole]}
                    </Badge>
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        )
      )}
    </>
  );
}
