import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import { apiFetch, json, query, type Page } from './client';
import type {
  CustomMaterialItem,
  DesignBasis,
  Member,
  MemberList,
  Project,
  SiteAsTyped,
  Role,
  UnitSystem,
  UserLookup,
} from '@hoopline/contract';

export interface ProjectListParams {
  readonly q?: string;
  readonly sort?: 'number' | 'name' | 'client' | 'updatedAt';
  readonly order?: 'asc' | 'desc';
  readonly page?: number;
  readonly pageSize?: number;
}

export interface ProjectInput {
  readonly number: string;
  readonly name: string;
  readonly client?: string;
  /** null clears the site (sea level); on create it is left out. */
  readonly site?: SiteAsTyped | null;
  readonly designBasis?: DesignBasis;
  /** The components' default design temperature; null clears it; left out keeps it (or none, on create). */
  readonly designTemperature?: string | number | null;
  readonly unitSystem: UnitSystem;
  readonly notes?: string;
}

export const projectKeys = {
  all: ['projects'] as const,
  list: (params: ProjectListParams) => ['projects', 'list', params] as const,
  one: (id: string) => ['projects', id] as const,
  members: (id: string) => ['projects', id, 'members'] as const,
  materials: (id: string) => ['projects', id, 'materials'] as const,
};

export function projectsQuery(params: ProjectListParams) {
  return queryOptions({
    queryKey: projectKeys.list(params),
    queryFn: () => apiFetch<Page<Project>>(`/projects${query({ ...params })}`),
    placeholderData: keepPreviousData,
  });
}

export function useProjects(params: ProjectListParams) {
  return useQuery(projectsQuery(params));
}

export function projectQuery(id: string) {
  return queryOptions({
    queryKey: projectKeys.one(id),
    queryFn: () => apiFetch<Project>(`/projects/${id}`),
  });
}

export function useProject(id: string) {
  return useQuery({ ...projectQuery(id), enabled: Boolean(id) });
}

export function useCreateProject() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ site, designTemperature, ...body }: ProjectInput) =>
      apiFetch<Project>(
        '/projects',
        json('POST', {
          ...body,
          ...(site ? { site } : {}),
          ...(designTemperature != null ? { designTemperature } : {}),
        }),
      ),
    onSuccess: (project) => {
      client.setQueryData(projectKeys.one(project.id), project);
      return client.invalidateQueries({ queryKey: projectKeys.all });
    },
  });
}

export function useUpdateProject(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (
      body: Partial<ProjectInput> & {
        /** The checkers' password again at sign-off (the owner and administrators change it). */
        signOffPassword?: boolean;
        version: number;
      },
    ) => apiFetch<Project>(`/projects/${id}`, json('PATCH', body)),
    onSuccess: (project) => {
      client.setQueryData(projectKeys.one(id), project);
      return client.invalidateQueries({ queryKey: ['projects', 'list'] });
    },
  });
}

export function useMembers(projectId: string) {
  return useQuery({
    queryKey: projectKeys.members(projectId),
    queryFn: () => apiFetch<MemberList>(`/projects/${projectId}/members`),
  });
}

export function useSetMember(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      apiFetch<Member>(`/projects/${projectId}/members/${userId}`, json('PUT', { role })),
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.members(projectId) }),
  });
}

export function useRemoveMember(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiFetch<void>(`/projects/${projectId}/members/${userId}`, json('DELETE')),
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.members(projectId) }),
  });
}

export function useProjectMaterials(projectId: string) {
  return useQuery({
    queryKey: projectKeys.materials(projectId),
    queryFn: () => apiFetch<{ items: CustomMaterialItem[] }>(`/projects/${projectId}/materials`),
  });
}

export function useAddProjectMaterial(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (material: Record<string, unknown>) =>
      apiFetch<CustomMaterialItem>(`/projects/${projectId}/materials`, json('POST', { material })),
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.materials(projectId) }),
  });
}

/** One person by their exact e-mail address (admins and designers; 404 when there is none). */
export function lookUpUser(email: string) {
  return apiFetch<UserLookup>(`/users/lookup${query({ email })}`);
}
