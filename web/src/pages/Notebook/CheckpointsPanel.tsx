import { Button, Flex, Heading, Table, Text, TextField } from '@radix-ui/themes';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { CHECKPOINT_NAME_MAX, type CheckpointView, type RestoreCheckpointResponse } from '@upwell/common';
import { api } from '../../api/client';
import { ErrorNote } from '../../components/ErrorNote';
import { TableCaption } from '../../components/TableCaption';
import { formatWhen } from '../../components/dates';

/**
 * Named checkpoints of the document. Restoring one changes the document back
 * for everyone, as an ordinary edit, so a later restore can undo it.
 */
export function CheckpointsPanel({ notebookId, editable }: { notebookId: string; editable: boolean }) {
  const qc = useQueryClient();
  const key = ['checkpoints', notebookId];
  const list = useQuery({ queryKey: key, queryFn: () => api<CheckpointView[]>(`/notebooks/${notebookId}/checkpoints`) });
  const create = useMutation({
    mutationFn: (name: string) => api<CheckpointView>(`/notebooks/${notebookId}/checkpoints`, { method: 'POST', body: { name } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: key }),
  });
  const restore = useMutation({ mutationFn: (id: string) => api<RestoreCheckpointResponse>(`/notebooks/${notebookId}/checkpoints/${id}/restore`, { method: 'POST' }) });
  const [name, setName] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(name, { onSuccess: () => setName('') });
  };
  const rows = list.data ?? [];
  return (
    <section aria-labelledby="checkpoints-heading">
      <Heading as="h2" size="4" id="checkpoints-heading" mb="2">
        Checkpoints
      </Heading>
      <Text as="p" size="2" color="gray" mb="3">
        A checkpoint keeps the text, figures and numbers’ settings as they are now. Restoring one brings the document back to it
        for everyone; restoring a later checkpoint undoes that.
      </Text>
      {editable && (
        <form onSubmit={submit} aria-label="Save a checkpoint">
          <Flex gap="2" mb="3">
            <TextField.Root aria-label="Checkpoint name" placeholder="e.g. Sent to co-authors, 1 Dec" required maxLength={CHECKPOINT_NAME_MAX} value={name} onChange={(e) => setName(e.target.value)} style={{ minWidth: 320 }} />
            <Button type="submit" loading={create.isPending}>
              Save checkpoint
            </Button>
          </Flex>
        </form>
      )}
      <ErrorNote error={list.error ?? create.error ?? restore.error} />
      {restore.data && (
        <Text as="p" size="2" role="status" mb="2">
          {restore.data.changed ? 'The document is back at that checkpoint for everyone.' : 'The document already matched that checkpoint.'}
        </Text>
      )}
      {rows.length === 0 ? (
        <Text size="2" color="gray">
          No checkpoints yet.
        </Text>
      ) : (
        <Table.Root size="1" variant="surface">
          <TableCaption>Checkpoints</TableCaption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Saved</Table.ColumnHeaderCell>
              {editable && <Table.ColumnHeaderCell />}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {rows.map((c) => (
              <Table.Row key={c.id}>
                <Table.RowHeaderCell>{c.name}</Table.RowHeaderCell>
                <Table.Cell>
                  {formatWhen(c.createdAt)}
                  {c.createdBy ? ` by ${c.createdBy.name}` : ''}
                </Table.Cell>
                {editable && (
                  <Table.Cell>
                    <Button size="1" variant="soft" onClick={() => restore.mutate(c.id)} loading={restore.isPending && restore.variables === c.id} aria-label={`Restore checkpoint ${c.name}`}>
                      Restore
                    </Button>
                  </Table.Cell>
                )}
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
    </section>
  );
}
