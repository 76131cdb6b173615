import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationRequest, AcceptInvitationResponse, InvitationPreview, MeResponse } from '@upwell/common';
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
