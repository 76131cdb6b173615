import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ListSeriesQuery, SeriesDetail, SeriesPage, SeriesUsage, SeriesValues, UpdateSeriesRequest } from '@upwell/common';
import { api } from './client';

export const seriesKeys = {
  all: ['series'] as const,
  list: (groupId: string, q: Partial<ListSeriesQuery>) => ['series', 'list', groupId, q] as const,
  detail: (id: string) => ['series', 'detail', id] as const,
  values: (id: string, version: number | 'latest') => ['series', 'values', id, version] as const,
};

/** One page of the group's series library. */
export function useSeriesList(groupId: string | undefined, q: Partial<ListSeriesQuery>) {
  return useQuery({
    queryKey: seriesKeys.list(groupId ?? '', q),
    queryFn: ({ signal }) => {
      const params = new URLSearchParams();
      for (const [k, v] of Object.entries(q)) if (v !== undefined && v !== '') params.set(k, String(v));
      return api<SeriesPage>(`/groups/${groupId}/series?${params}`, { signal });
    },
    enabled: !!groupId,
    placeholderData: keepPreviousData,
  });
}

/** A series with its versions. */
export function useSeries(id: string) {
  return useQuery({ queryKey: seriesKeys.detail(id), queryFn: () => api<SeriesDetail>(`/series/${id}`) });
}

/** The values of one version. */
export function useSeriesValues(id: string, version: number | 'latest') {
  return useQuery({ queryKey: seriesKeys.values(id, version), queryFn: () => api<SeriesValues>(`/series/${id}/versions/${version}/values`) });
}

/** Edit metadata (members). */
export function useUpdateSeries(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateSeriesRequest) => api<SeriesDetail>(`/series/${id}`, { method: 'PATCH', body }),
    onSuccess: (s) => {
      qc.setQueryData(seriesKeys.detail(id), s);
      return qc.invalidateQueries({ queryKey: ['series', 'list'] });
    },
  });
}

/** Delete (group admins). */
export function useDeleteSeries(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/series/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: seriesKeys.all }),
  });
}

/** Notebooks that bind the series (asked before deleting it). */
export function useSeriesUsage(id: string, enabled: boolean) {
  return useQuery({ queryKey: ['series', 'usage', id], queryFn: () => api<SeriesUsage>(`/series/${id}/usage`), enabled });
}
