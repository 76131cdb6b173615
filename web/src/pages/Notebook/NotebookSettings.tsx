import { Button, Flex, Text, TextField } from '@radix-ui/themes';
import { ConfirmDelete } from '../../components/ConfirmDelete';
import { useState, type FormEvent } from 'react';
import { LIMITS } from '@upwell/common';
import { useNavigate } from 'react-router';
import type { NotebookView } from '@upwell/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import { notebookKeys, useDeleteNotebook, useUpdateNotebook } from '../../api/notebooks';
import { ErrorNote } from '../../components/ErrorNote';

/** Archive, duplicate and delete: the lead author's tools for the notebook as a whole. */
export function NotebookSettings({ notebook }: { notebook: NotebookView }) {
  const update = useUpdateNotebook(notebook.id);
  const remove = useDeleteNotebook(notebook.id);
  const qc = useQueryClient();
  const navigate = useNavigate();
  const duplicate = useMutation({
    mutationFn: () => api<NotebookView>(`/notebooks/${notebook.id}/duplicate`, { method: 'POST' }),
    onSuccess: async (copy) => {
      await qc.invalidateQueries({ queryKey: notebookKeys.all });
      navigate(`/notebooks/${copy.id}`);
    },
  });
  const [title, setTitle] = useState(notebook.title);
  const rename = (e: FormEvent) => {
    e.preventDefault();
    update.mutate({ title });
  };
  if (!notebook.allowed.includes('delete')) {
    return <Text size="2" color="gray">Only the lead author can archive, duplicate or delete this notebook.</Text>;
  }
  return (
    <Flex direction="column" gap="3">
      <form onSubmit={rename} aria-label="Rename notebook">
        <Flex gap="2">
          <TextField.Root aria-label="Notebook title" required maxLength={LIMITS.notebookTitleMax} value={title} onChange={(e) => setTitle(e.target.value)} style={{ minWidth: 360 }} />
          <Button type="submit" variant="soft" disabled={title.trim() === notebook.title}>
            Rename
          </Button>
        </Flex>
      </form>
      <Flex gap="3" wrap="wrap">
        <Button variant="soft" onClick={() => update.mutate({ archived: !notebook.archived })} loading={update.isPending}>
          {notebook.archived ? 'Restore from archive' : 'Archive notebook'}
        </Button>
        <Button variant="soft" onClick={() => duplicate.mutate()} loading={duplicate.isPending}>
          Duplicate notebook
        </Button>
        <ConfirmDelete
          label="Delete notebook"
          title={`Delete “${notebook.title}”?`}
          description="The document, its event sets and everyone’s roles on it are removed for good. Archive it instead to keep it out of the way."
          onConfirm={() => remove.mutate(undefined, { onSuccess: () => navigate('/notebooks') })}
        />
      </Flex>
      <ErrorNote error={update.error ?? remove.error ?? duplicate.error} />
    </Flex>
  );
}
