import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateNotebookRequest, NotebookRole, NotebookRoleView, NotebookView, UpdateNotebookRequest } from '@upwell/common';
import { api } from './client';

export const notebookKeys = {
  list: (groupId: string, q: string, archived: boolean) => ['notebooks', groupId, { q, archived }] as const,
  all: ['notebooks'] as const,
  detail: (id: string) => ['notebook', id] as const,
  roles: (id: string) => ['notebook', id, 'roles'] as const,
};

/** The group's notebooks the person holds a role on. */
export function useNotebooks(groupId: string | undefined, q: string, archived = false) {
  return useQuery({
    queryKey: notebookKeys.list(groupId ?? '', q, archived),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      if (q) params.set('q', q);
      if (archived) params.set('archived', 'true');
      return api<NotebookView[]>(`/groups/${groupId}/notebooks?${params}`, { signal });
    },
    enabled: !!groupId,
    placeholderData: keepPreviousData,
  });
}

/** Creates a notebook in a group. */
export function useCreateNotebook(groupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateNotebookRequest) => api<NotebookView>(`/groups/${groupId}/notebooks`, { method: 'POST', body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: notebookKeys.all }),
  });
}

/** One notebook. */
export function useNotebook(id: string) {
  return useQuery({ queryKey: notebookKeys.detail(id), queryFn: () => api<NotebookView>(`/notebooks/${id}`) });
}

/** Rename, describe, archive (lead author). */
export function useUpdateNotebook(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateNotebookRequest) => api<NotebookView>(`/notebooks/${id}`, { method: 'PATCH', body }),
    onSuccess: (nb) => {
      qc.setQueryData(notebookKeys.detail(id), nb);
      return qc.invalidateQueries({ queryKey: notebookKeys.all });
    },
  });
}

/** Delete (lead author). */
export function useDeleteNotebook(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/notebooks/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: notebookKeys.all }),
  });
}

/** Who holds which role on the notebook, and changes to it (lead author). */
export function useNotebookRoles(id: string) {
  const qc = useQueryClient();
  const key = notebookKeys.roles(id);
  return {
    list: useQuery({ queryKey: key, queryFn: () => api<NotebookRoleView[]>(`/notebooks/${id}/roles`) }),
    assign: useMutation({
      mutationFn: ({ userId, role }: { userId: string; role: NotebookRole }) =>
        api<NotebookRoleView[]>(`/notebooks/${id}/roles/${userId}`, { method: 'PUT', body: { role } }),
      onSuccess: (roles) => {
        qc.setQueryData(key, roles);
        return qc.invalidateQueries({ queryKey: notebookKeys.detail(id) });
      },
    }),
    remove: useMutation({
      mutationFn: (userId: string) => api<void>(`/notebooks/${id}/roles/${userId}`, { method: 'DELETE' }),
      onSuccess: () => qc.invalidateQueries({ queryKey: key }),
    }),
  };
}
