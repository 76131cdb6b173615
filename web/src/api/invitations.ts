import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationRequest, AcceptInvitationResponse, CreatedInvitationView, InvitationList, InvitationPreview, MailOutbox, MailStatus, MeResponse } from '@upwell/common';
import { authKeys } from './auth';
import { api, setToken } from './client';

/** What an invitation link offers (public; 404 unknown, 410 used, revoked or expired). */
export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: ['invitation', token],
    queryFn: () => api<InvitationPreview>(`/invitations/${encodeURIComponent(token)}`),
    retry: false,
  });
}

/** Accepts the invitation (as the signed-in person, or by signing up or in) and keeps the token it answers with. */
export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInvitationRequest) => api<AcceptInvitationResponse>(`/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST', body }),
    onSuccess: async (res) => {
      setToken(res.accessToken);
      qc.clear();
      await qc.fetchQuery({ queryKey: authKeys.me, queryFn: () => api<MeResponse>('/auth/me') });
    },
  });
}

/** Pending invitations of a group (`/groups/:id`) or a notebook (`/notebooks/:id`), with send and revoke. */
export function useInvitations(base: string) {
  const qc = useQueryClient();
  const key = ['invitations', base];
  const list = useQuery({ queryKey: key, queryFn: () => api<InvitationList>(`${base}/invitations`) });
  const done = () => qc.invalidateQueries({ queryKey: key });
  const send = useMutation({
    mutationFn: (body: { email: string; role: string }) => api<CreatedInvitationView>(`${base}/invitations`, { method: 'POST', body }),
    onSuccess: done,
  });
  const revoke = useMutation({ mutationFn: (id: string) => api<void>(`${base}/invitations/${id}`, { method: 'DELETE' }), onSuccess: done });
  return { list, send, revoke };
}

/** Whether the local mailbox is in use (only then is there an outbox to show). */
export function useMailStatus(enabled: boolean) {
  return useQuery({ queryKey: ['mail-status'], queryFn: () => api<MailStatus>('/mail/status'), enabled, staleTime: Infinity });
}

/** The captured mail of the groups the person administers. */
export function useMailOutbox() {
  return useQuery({ queryKey: ['mail-outbox'], queryFn: () => api<MailOutbox>('/mail/outbox'), refetchInterval: 5000 });
}
