// Queries and mutations for requests and projects: one key factory, invalidation on success.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RequestFilingFields } from '../../shared/requests/filing';
import type { ProjectSummary, RequestDetail, RequestSummary } from '../../shared/requests/types';
import { apiFetch } from '../api/http';

export const requestKeys = {
  all: ['requests'] as const,
  list: (scope: 'desk' | 'all') => ['requests', 'list', scope] as const,
  detail: (id: string) => ['requests', 'detail', id] as const,
  projects: ['projects'] as const,
};

export function useRequestList(scope: 'desk' | 'all') {
  return useQuery({
    queryKey: requestKeys.list(scope),
    queryFn: () => apiFetch<RequestSummary[]>(scope === 'desk' ? '/api/requests?desk=mine' : '/api/requests'),
    staleTime: 15_000,
  });
}

export function useRequestDetail(id: string) {
  return useQuery({
    queryKey: requestKeys.detail(id),
    queryFn: () => apiFetch<RequestDetail>(`/api/requests/${encodeURIComponent(id)}`),
    staleTime: 15_000,
  });
}

export function useMyProjects() {
  return useQuery({ queryKey: requestKeys.projects, queryFn: () => apiFetch<ProjectSummary[]>('/api/projects'), staleTime: 5 * 60_000 });
}

export type PickedFile = { name: string; size: number; type: string; blob: Blob };

export function useFileRequest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ fields, files }: { fields: RequestFilingFields; files: PickedFile[] }) => {
      const form = new FormData();
      form.append('projectId', fields.projectId);
      form.append('title', fields.title);
      form.append('reason', fields.reason);
      for (const f of files) form.append('files', f.blob, f.name);
      return apiFetch<RequestDetail>('/api/requests', { method: 'POST', body: form });
    },
    onSuccess: (filed) => {
      queryClient.setQueryData(requestKeys.detail(filed.id), filed);
      return queryClient.invalidateQueries({ queryKey: requestKeys.all });
    },
  });
}

export function attachmentUrl(attachmentId: string): string {
  return `/api/attachments/${encodeURIComponent(attachmentId)}/content`;
}
