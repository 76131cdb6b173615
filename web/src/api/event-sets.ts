import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EventSetView, SaveEventSetRequest, SeriesBinding, EventSource } from '@upwell/common';
import { api } from './client';

export const eventSetKeys = { list: (notebookId: string) => ['event-sets', notebookId] as const };

/** One detected or saved event, as the event table edits it. */
export interface EditableEvent {
  phase: 'warm' | 'cold';
  start: string;
  peak: string;
  end: string;
  label: string;
}

/** The notebook's saved event sets and changes to them (co-authors and the lead author). */
export function useEventSets(notebookId: string) {
  const qc = useQueryClient();
  const key = eventSetKeys.list(notebookId);
  const done = () => Promise.all([qc.invalidateQueries({ queryKey: key }), qc.invalidateQueries({ queryKey: ['figure', notebookId] })]);
  return {
    list: useQuery({ queryKey: key, queryFn: () => api<EventSetView[]>(`/notebooks/${notebookId}/event-sets`) }),
    create: useMutation({ mutationFn: (body: SaveEventSetRequest) => api<EventSetView>(`/notebooks/${notebookId}/event-sets`, { method: 'POST', body }), onSuccess: done }),
    update: useMutation({
      mutationFn: ({ id, body }: { id: string; body: SaveEventSetRequest }) => api<EventSetView>(`/notebooks/${notebookId}/event-sets/${id}`, { method: 'PUT', body }),
      onSuccess: done,
    }),
    remove: useMutation({ mutationFn: (id: string) => api<void>(`/notebooks/${notebookId}/event-sets/${id}`, { method: 'DELETE' }), onSuccess: done }),
    detect: useMutation({
      mutationFn: (body: { index: SeriesBinding; rule: EventSource }) => api<{ events: EditableEvent[] }>(`/notebooks/${notebookId}/event-sets/detect`, { method: 'POST', body }),
    }),
  };
}
