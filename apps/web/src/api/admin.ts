import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch, json, query, type Page } from './client';
import type {
  AuditEvent,
  Invitation,
  InvitationCreated,
  PasswordResetIssued,
  Settings,
  User,
} from '@hoopline/contract';

export function useUsers(params: { q?: string; page?: number; pageSize?: number }) {
  return useQuery({
    queryKey: ['users', params],
    queryFn: () => apiFetch<Page<User>>(`/users${query({ ...params })}`),
    placeholderData: keepPreviousData,
  });
}

export function useUpdateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({
      id,
      ...body
    }: {
      id: string;
      name?: string;
      isAdmin?: boolean;
      active?: boolean;
      mayCreateProjects?: boolean;
    }) => apiFetch<User>(`/users/${id}`, json('PATCH', body)),
    onSuccess: () => client.invalidateQueries({ queryKey: ['users'] }),
  });
}

export function useSettings() {
  return useQuery({ queryKey: ['settings'], queryFn: () => apiFetch<Settings>('/settings') });
}

export function useUpdateSettings() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<Settings>) => apiFetch<Settings>('/settings', json('PATCH', body)),
    onSuccess: (settings) => client.setQueryData(['settings'], settings),
  });
}

export function useIssuePasswordReset() {
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<PasswordResetIssued>(`/users/${id}/password-reset`, json('POST')),
  });
}

export function useInvitations(page = 1) {
  return useQuery({
    queryKey: ['invitations', page],
    queryFn: () => apiFetch<Page<Invitation>>(`/invitations${query({ page })}`),
    placeholderData: keepPreviousData,
  });
}

export function useCreateInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { email: string; name: string; isAdmin?: boolean }) =>
      apiFetch<InvitationCreated>('/invitations', json('POST', body)),
    onSuccess: () => client.invalidateQueries({ queryKey: ['invitations'] }),
  });
}

export function useRevokeInvitation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/invitations/${id}`, json('DELETE')),
    onSuccess: () => client.invalidateQueries({ queryKey: ['invitations'] }),
  });
}

export interface AuditFilter {
  readonly projectId?: string;
  readonly actorId?: string;
  readonly action?: string;
  readonly entityType?: string;
  readonly from?: string;
  readonly to?: string;
  readonly page?: number;
}

export function useAudit(filter: AuditFilter) {
  return useQuery({
    queryKey: ['audit', filter],
    queryFn: () => apiFetch<Page<AuditEvent>>(`/audit${query({ ...filter, pageSize: 50 })}`),
    placeholderData: keepPreviousData,
  });
}
