import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch, json, query, type Page } from './client';
import { componentKeys } from './components';
import type { Revision, RevisionDiff, RevisionSummary } from '@hoopline/contract';

export const revisionKeys = {
  one: (id: string) => ['revisions', id] as const,
  diff: (id: string, against: string) => ['revisions', id, 'diff', against] as const,
};

export function componentRevisionsQuery(componentId: string, page = 1) {
  return queryOptions({
    queryKey: [...componentKeys.revisions(componentId), page],
    queryFn: () =>
      apiFetch<Page<RevisionSummary>>(
        `/components/${componentId}/revisions${query({ page, pageSize: 50 })}`,
      ),
  });
}

export function useComponentRevisions(componentId: string, page = 1) {
  return useQuery(componentRevisionsQuery(componentId, page));
}

export function revisionQuery(id: string) {
  return queryOptions({
    queryKey: revisionKeys.one(id),
    queryFn: () => apiFetch<Revision>(`/revisions/${id}`),
  });
}

export function useRevision(id: string | undefined) {
  return useQuery({ ...revisionQuery(id ?? ''), enabled: Boolean(id) });
}

export function useRevisionDiff(id: string, against: string) {
  return useQuery({
    queryKey: revisionKeys.diff(id, against),
    queryFn: () => apiFetch<RevisionDiff>(`/revisions/${id}/diff${query({ against })}`),
    enabled: Boolean(id && against),
  });
}

/** After a workflow action every list that shows statuses is stale. */
function useWorkflowMutation<Body>(action: 'submit' | 'withdraw' | 'countersign' | 'return') {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body?: Body }) =>
      apiFetch<Revision>(`/revisions/${id}/${action}`, json('POST', body ?? {})),
    onSuccess: (revision) => {
      client.setQueryData(revisionKeys.one(revision.id), revision);
      return Promise.all([
        client.invalidateQueries({ queryKey: ['check-queue'] }),
        client.invalidateQueries({ queryKey: ['issued'] }),
        client.invalidateQueries({ queryKey: componentKeys.one(revision.componentId) }),
        client.invalidateQueries({ queryKey: componentKeys.revisions(revision.componentId) }),
        client.invalidateQueries({ queryKey: componentKeys.ofProject(revision.projectId) }),
      ]);
    },
  });
}

export const useSubmitRevision = () => useWorkflowMutation<never>('submit');
export const useWithdrawRevision = () => useWorkflowMutation<never>('withdraw');
export const useCountersign = () =>
  useWorkflowMutation<{ hash: string; comment?: string }>('countersign');
export const useReturnRevision = () =>
  useWorkflowMutation<{ hash: string; comment: string }>('return');
