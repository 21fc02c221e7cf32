import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch, json, query, type Page } from './client';
import { componentKeys } from './components';
import type {
  CountersignBody,
  ReturnBody,
  Revision,
  RevisionDiff,
  RevisionSummary,
  SubmittedRevision,
} from '@hoopline/contract';

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
function useWorkflowMutation<Body, Result extends Revision = Revision>(
  action: 'submit' | 'withdraw' | 'countersign' | 'return',
) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body?: Body }) =>
      apiFetch<Result>(`/revisions/${id}/${action}`, json('POST', body ?? {})),
    onSuccess: (answer) => {
      // The cache keeps the revision, not the warnings that came with this answer.
      const { warnings: _warnings, ...revision } = answer as Result & { warnings?: unknown };
      client.setQueryData(revisionKeys.one(revision.id), revision);
      return Promise.all([
        client.invalidateQueries({ queryKey: ['check-queue'] }),
        client.invalidateQueries({ queryKey: ['returned'] }),
        client.invalidateQueries({ queryKey: ['issued'] }),
        client.invalidateQueries({ queryKey: componentKeys.one(revision.componentId) }),
        client.invalidateQueries({ queryKey: componentKeys.revisions(revision.componentId) }),
        client.invalidateQueries({ queryKey: componentKeys.ofProject(revision.projectId) }),
      ]);
    },
  });
}

/** Submits for check; the answer may warn (no checker on the project: issue 16.3). */
export const useSubmitRevision = () => useWorkflowMutation<never, SubmittedRevision>('submit');
export const useWithdrawRevision = () => useWorkflowMutation<never>('withdraw');
/** The body may carry the checker's password, where the project asks for it (issue 16.2). */
export const useCountersign = () => useWorkflowMutation<CountersignBody>('countersign');
export const useReturnRevision = () => useWorkflowMutation<ReturnBody>('return');
