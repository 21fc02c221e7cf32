import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch, json } from './client';
import type { Me, UnitSystem, VacuumUnit } from '@hoopline/contract';

export const meQuery = queryOptions({
  queryKey: ['me'],
  queryFn: () => apiFetch<Me>('/me'),
  staleTime: 60_000,
});

/** The signed-in user; only used under the signed-in layout, whose loader made sure of it. */
export function useMe(): Me {
  const { data } = useQuery(meQuery);
  if (!data) throw new Error('useMe outside the signed-in layout');
  return data;
}

export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { email: string; password: string }) =>
      apiFetch<Me>('/auth/sign-in', json('POST', body)),
    onSuccess: (me) => {
      client.clear();
      client.setQueryData(meQuery.queryKey, me);
    },
  });
}

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>('/auth/sign-out', json('POST')),
    onSettled: () => client.clear(),
  });
}

export function invitationQuery(token: string) {
  return queryOptions({
    queryKey: ['invitation', token],
    queryFn: () => apiFetch<{ email: string; name: string }>(`/auth/invitations/${token}`),
  });
}

export function useAcceptInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { token: string; name: string; password: string }) =>
      apiFetch<Me>('/auth/accept-invitation', json('POST', body)),
    onSuccess: (me) => {
      client.clear();
      client.setQueryData(meQuery.queryKey, me);
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: { email: string }) =>
      apiFetch<void>('/auth/password-reset/request', json('POST', body)),
  });
}

export function useCompletePasswordReset() {
  return useMutation({
    mutationFn: (body: { token: string; password: string }) =>
      apiFetch<void>('/auth/password-reset/complete', json('POST', body)),
  });
}

export function useUpdateMe() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: {
      name?: string;
      unitSystem?: UnitSystem;
      vacuumUnit?: VacuumUnit | null;
    }) => apiFetch<Me>('/me', json('PATCH', body)),
    onSuccess: (me) => client.setQueryData(meQuery.queryKey, me),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (body: { currentPassword: string; newPassword: string }) =>
      apiFetch<void>('/me/password', json('POST', body)),
  });
}
