import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiFetch, json, query, type Page } from './client';
import type { Component, ComponentTable, Revision } from '@hoopline/contract';

export const componentKeys = {
  ofProject: (projectId: string) => ['projects', projectId, 'components'] as const,
  one: (id: string) => ['components', id] as const,
  revisions: (id: string) => ['components', id, 'revisions'] as const,
};

export function projectComponentsQuery(projectId: string, params: { q?: string; page?: number }) {
  return queryOptions({
    queryKey: [...componentKeys.ofProject(projectId), params],
    queryFn: () =>
      apiFetch<Page<Component>>(`/projects/${projectId}/components${query({ ...params })}`),
  });
}

export function useProjectComponents(projectId: string, params: { q?: string; page?: number }) {
  return useQuery(projectComponentsQuery(projectId, params));
}

/** Every component of a project with its latest revision's stored governing check (the project table). */
export function componentTableQuery(projectId: string) {
  return queryOptions({
    // Under ofProject: whatever invalidates a project's components refreshes its table.
    queryKey: [...componentKeys.ofProject(projectId), 'table'],
    queryFn: () => apiFetch<ComponentTable>(`/projects/${projectId}/components/table`),
  });
}

export function useComponentTable(projectId: string) {
  return useQuery(componentTableQuery(projectId));
}

export function componentQuery(id: string) {
  return queryOptions({
    queryKey: componentKeys.one(id),
    queryFn: () => apiFetch<Component>(`/components/${id}`),
  });
}

export function useComponent(id: string) {
  return useQuery({ ...componentQuery(id), enabled: Boolean(id) });
}

export interface SavedRevision {
  readonly component: Component;
  readonly revision: Revision;
}

export function useCreateComponent(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { name: string; tag?: string; inputs: unknown; note?: string }) =>
      apiFetch<SavedRevision>(`/projects/${projectId}/components`, json('POST', body)),
    onSuccess: (saved) => {
      client.setQueryData(componentKeys.one(saved.component.id), saved.component);
      client.setQueryData(['revisions', saved.revision.id], saved.revision);
      return client.invalidateQueries({ queryKey: componentKeys.ofProject(projectId) });
    },
  });
}

export function useUpdateComponent(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { name?: string; tag?: string; version: number }) =>
      apiFetch<Component>(`/components/${id}`, json('PATCH', body)),
    onSuccess: (component) => {
      client.setQueryData(componentKeys.one(id), component);
      return client.invalidateQueries({ queryKey: componentKeys.ofProject(component.projectId) });
    },
  });
}

export function useSaveRevision(componentId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: { inputs: unknown; baseVersion: number; note?: string }) =>
      apiFetch<SavedRevision>(`/components/${componentId}/revisions`, json('POST', body)),
    onSuccess: (saved) => {
      client.setQueryData(componentKeys.one(componentId), saved.component);
      client.setQueryData(['revisions', saved.revision.id], saved.revision);
      return Promise.all([
        client.invalidateQueries({ queryKey: componentKeys.revisions(componentId) }),
        client.invalidateQueries({ queryKey: componentKeys.ofProject(saved.component.projectId) }),
        // A new revision takes a returned one off "Returned to me".
        client.invalidateQueries({ queryKey: ['returned'] }),
      ]);
    },
  });
}
