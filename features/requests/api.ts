// Queries and mutations for requests and projects: one key factory, invalidation on success.
import { useInfiniteQuery, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { RequestListQuery } from '../../shared/requests/listQuery';
import type { RequestDraft } from '../../shared/requests/requestBody';
import type { ProjectSummary, RequestDetail, RequestPage, RequestSummary } from '../../shared/requests/types';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import { ApiError, apiFetch } from '../api/http';

export type RequestListFilters = Omit<Partial<RequestListQuery>, 'cursor'>;
export type PersonOption = { id: string; name: string; email: string; organization: string | null };
export type TrailCheck = { ok: true; events: number } | { ok: false; brokenAt: number };

export const requestKeys = {
  all: ['requests'] as const,
  lists: () => ['requests', 'list'] as const,
  list: (filters: RequestListFilters) => ['requests', 'list', filters] as const,
  detail: (id: string) => ['requests', 'detail', id] as const,
  engineersOfRecord: (id: string) => ['requests', 'detail', id, 'engineers-of-record'] as const,
  trailCheck: (id: string) => ['requests', 'detail', id, 'trail-check'] as const,
  projects: ['projects'] as const,
};

const requestPath = (id: string) => `/api/requests/${encodeURIComponent(id)}`;

function sendJson<T>(path: string, method: 'POST' | 'PUT', body: unknown): Promise<T> {
  return apiFetch<T>(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
}

function listPath(filters: RequestListFilters, cursor: string | undefined): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  if (cursor) params.set('cursor', cursor);
  const query = params.toString();
  return query ? `/api/requests?${query}` : '/api/requests';
}

// Pages come oldest-at-desk first; `items` is every page loaded so far, in that order.
export function useRequestList(filters: RequestListFilters) {
  const query = useInfiniteQuery({
    queryKey: requestKeys.list(filters),
    queryFn: ({ pageParam }) => apiFetch<RequestPage>(listPath(filters, pageParam)),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
    staleTime: 15_000,
  });
  const items: RequestSummary[] = query.data?.pages.flatMap((p) => p.items) ?? [];
  return { ...query, items };
}

export function useRequestDetail(id: string) {
  return useQuery({
    queryKey: requestKeys.detail(id),
    queryFn: () => apiFetch<RequestDetail>(requestPath(id)),
    staleTime: 15_000,
  });
}

export function useEngineersOfRecord(id: string, enabled: boolean) {
  return useQuery({
    queryKey: requestKeys.engineersOfRecord(id),
    queryFn: () => apiFetch<PersonOption[]>(`${requestPath(id)}/engineers-of-record`),
    enabled,
    staleTime: 5 * 60_000,
  });
}

// Run on demand only: the check reads the whole trail, and the answer is for the moment it is asked.
export function useTrailCheck(id: string) {
  return useQuery({
    queryKey: requestKeys.trailCheck(id),
    queryFn: () => apiFetch<TrailCheck>(`${requestPath(id)}/trail/verify`),
    enabled: false,
    staleTime: 0,
  });
}

export function useMyProjects() {
  return useQuery({ queryKey: requestKeys.projects, queryFn: () => apiFetch<ProjectSummary[]>('/api/projects'), staleTime: 5 * 60_000 });
}

// A changed request may move between desks, so every list is stale; the detail we already hold.
function settle(queryClient: QueryClient, detail: RequestDetail) {
  queryClient.setQueryData(requestKeys.detail(detail.id), detail);
  return queryClient.invalidateQueries({ queryKey: requestKeys.lists() });
}

export function useCreateDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (draft: RequestDraft) => sendJson<RequestDetail>('/api/requests', 'POST', draft),
    onSuccess: (detail) => settle(queryClient, detail),
  });
}

export function useUpdateDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, version, body }: { id: string; version: number; body: RequestDraft }) =>
      sendJson<RequestDetail>(`${requestPath(id)}/draft`, 'PUT', { version, body }),
    onSuccess: (detail) => settle(queryClient, detail),
  });
}

export type PickedFile = { name: string; size: number; type: string; blob: Blob };

export function useWorkflowEvent() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, event }: { id: string; event: WorkflowEventInput }) => sendJson<RequestDetail>(`${requestPath(id)}/events`, 'POST', event),
    onSuccess: (detail) => settle(queryClient, detail),
    // A 409 means what we showed is out of date (someone moved it, or it is not ready): show the
    // request as it is now so the person can decide again.
    onError: (err, { id }) => {
      if (err instanceof ApiError && err.status === 409) return queryClient.invalidateQueries({ queryKey: requestKeys.detail(id) });
    },
  });
}

export function useAddComment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, comment }: { id: string; comment: string }) => sendJson<RequestDetail>(`${requestPath(id)}/comments`, 'POST', { comment }),
    onSuccess: (detail) => settle(queryClient, detail),
  });
}

export function attachmentUrl(attachmentId: string): string {
  return `/api/attachments/${encodeURIComponent(attachmentId)}/content`;
}
