import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotebookView } from '@upwell/common';
import { ApiError, api } from './client';
import { downloadFile } from './download';
import { notebookKeys } from './notebooks';

/** Downloads a notebook as an Upwell notebook file (`<slug>.upwell.json`). */
export function useExportNotebookFile(notebookId: string) {
  return useMutation({ mutationFn: () => downloadFile(`/notebooks/${notebookId}/export`, 'notebook.upwell.json') });
}

/** Reads a chosen file as JSON; a file that is not JSON is refused here with the same kind of error as the server's. */
async function readJsonFile(file: File): Promise<unknown> {
  try {
    return JSON.parse(await file.text());
  } catch {
    throw new ApiError(400, `“${file.name}” is not a notebook file: it is not JSON`);
  }
}

/** Imports a notebook file into a group; the server names every series it could not find. */
export function useImportNotebookFile(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (file: File) => api<NotebookView>(`/groups/${groupId}/notebooks/import`, { method: 'POST', body: await readJsonFile(file) }),
    onSuccess: () => qc.invalidateQueries({ queryKey: notebookKeys.all }),
  });
}
