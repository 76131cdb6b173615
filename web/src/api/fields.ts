import { useQuery } from '@tanstack/react-query';
import type { FieldsList } from '@upwell/common';
import { api } from './client';

/** Query keys of a group's gridded and zonal-mean fields. */
export const fieldKeys = {
  group: (groupId: string) => ['fields', groupId] as const,
};

/** The group's stored fields (gridded variables kept from uploads, and their zonal means). */
export function useFields(groupId: string | undefined) {
  return useQuery({ queryKey: fieldKeys.group(groupId ?? ''), queryFn: () => api<FieldsList>(`/groups/${groupId}/fields`), enabled: !!groupId });
}
