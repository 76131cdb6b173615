import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AddMemberRequest, CreateGroupRequest, GroupDetail, GroupRole } from '@upwell/common';
import { authKeys } from './auth';
import { api } from './client';

export const groupKeys = {
  detail: (id: string) => ['groups', id] as const,
};

/** A group with its members. */
export function useGroup(groupId: string | undefined) {
  return useQuery({
    queryKey: groupKeys.detail(groupId ?? ''),
    queryFn: () => api<GroupDetail>(`/groups/${groupId}`),
    enabled: !!groupId,
  });
}

/** Creates a group; the person becomes its admin. */
export function useCreateGroup() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateGroupRequest) => api<GroupDetail>('/groups', { method: 'POST', body }),
    onSuccess: async (g) => {
      qc.setQueryData(groupKeys.detail(g.id), g);
      await qc.invalidateQueries({ queryKey: authKeys.me });
    },
  });
}

/** Changes to a group's membership (admins). */
export function useGroupMembers(groupId: string) {
  const qc = useQueryClient();
  const done = (g?: GroupDetail) => (g ? qc.setQueryData(groupKeys.detail(groupId), g) : qc.invalidateQueries({ queryKey: groupKeys.detail(groupId) }));
  return {
    add: useMutation({
      mutationFn: (body: AddMemberRequest) => api<GroupDetail>(`/groups/${groupId}/members`, { method: 'POST', body }),
      onSuccess: done,
    }),
    changeRole: useMutation({
      mutationFn: ({ userId, role }: { userId: string; role: GroupRole }) =>
        api<GroupDetail>(`/groups/${groupId}/members/${userId}`, { method: 'PATCH', body: { role } }),
      onSuccess: done,
    }),
    remove: useMutation({
      mutationFn: (userId: string) => api<void>(`/groups/${groupId}/members/${userId}`, { method: 'DELETE' }),
      onSuccess: () => done(),
    }),
  };
}
