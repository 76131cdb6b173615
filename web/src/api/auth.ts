import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AuthResponse, LoginRequest, MeResponse, RegisterRequest, UpdateMeRequest } from '@upwell/common';
import { api, getToken, setToken } from './client';

export const authKeys = { me: ['me'] as const };

/** The signed-in person; disabled (and null) without a token. */
export function useMe() {
  return useQuery({
    queryKey: authKeys.me,
    queryFn: () => api<MeResponse>('/auth/me'),
    enabled: getToken() !== null,
    retry: false,
    staleTime: 60_000,
  });
}

function useSignedIn() {
  const qc = useQueryClient();
  return async (res: AuthResponse) => {
    setToken(res.accessToken);
    qc.clear();
    await qc.fetchQuery({ queryKey: authKeys.me, queryFn: () => api<MeResponse>('/auth/me') });
  };
}

/** Signs in and loads the person. */
export function useLogin() {
  const signedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: LoginRequest) => api<AuthResponse>('/auth/login', { method: 'POST', body }),
    onSuccess: signedIn,
  });
}

/** Creates an account and signs in. */
export function useRegister() {
  const signedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: RegisterRequest) => api<AuthResponse>('/auth/register', { method: 'POST', body }),
    onSuccess: signedIn,
  });
}

/** Signs out everywhere and forgets everything cached. */
export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/auth/logout', { method: 'POST' }),
    onSettled: () => {
      setToken(null);
      qc.clear();
    },
  });
}

/** Changes the person's display name. */
export function useUpdateMe() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateMeRequest) => api<MeResponse>('/users/me', { method: 'PATCH', body }),
    onSuccess: (me) => qc.setQueryData(authKeys.me, me),
  });
}
