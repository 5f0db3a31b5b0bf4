// Queries and mutations for requests and projects: one key factory, invalidation on success.
import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RequestCounts } from '../../shared/requests/listQuery';
import type { RequestDraft } from '../../shared/requests/requestBody';
import type { Actor, ProjectSummary, RequestDetail, RequestPage, RequestSummary, TrailEntry } from '../../shared/requests/types';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import { ApiError, apiFetch } from '../api/http';
import { actorKey } from '../auth/useActor';
import { requestKeys, settle, type PersonOption, type RequestCountFilters, type RequestListFilters, type TrailCheck } from './requestCache';

export { requestKeys, settle, type PersonOption, type RequestCountFilters, type RequestListFilters, type TrailCheck } from './requestCache';

const requestPath = (id: string) => `/api/requests/${encodeURIComponent(id)}`;

function sendJson<T>(path: string, method: 'POST' | 'PUT', body: unknown): Promise<T> {
  return apiFetch<T>(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
}

function listPath(base: string, filters: RequestCountFilters, cursor?: string): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  if (cursor) params.set('cursor', cursor);
  const query = params.toString();
  return query ? `${base}?${query}` : base;
}

// Pages come oldest-at-desk first; `items` is every page loaded so far, in that order.
export function useRequestList(filters: RequestListFilters) {
  const query = useInfiniteQuery({
    queryKey: requestKeys.list(filters),
    queryFn: ({ pageParam }) => apiFetch<RequestPage>(listPath('/api/requests', filters, pageParam)),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
    staleTime: 15_000,
  });
  const items: RequestSummary[] = query.data?.pages.flatMap((p) => p.items) ?? [];
  return { ...query, items };
}

export function useRequestCounts(filters: RequestCountFilters) {
  return useQuery({
    queryKey: requestKeys.counts(filters),
    queryFn: () => apiFetch<RequestCounts>(listPath('/api/requests/counts', filters)),
    staleTime: 15_000,
  });
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

// A provisional trail entry shows the comment at once; it has no hash until the server answers.
export const pendingTrailHash = '';

export function useAddComment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, comment }: { id: string; comment: string }) => sendJson<RequestDetail>(`${requestPath(id)}/comments`, 'POST', { comment }),
    onMutate: async ({ id, comment }) => {
      const key = requestKeys.detail(id);
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<RequestDetail>(key);
      const actor = queryClient.getQueryData<Actor | null>(actorKey);
      if (before && actor) {
        const last = before.trail[before.trail.length - 1];
        const provisional: TrailEntry = {
          seq: (last?.seq ?? 0) + 1,
          eventType: 'commented',
          stateBefore: before.state,
          stateAfter: before.state,
          actor: { id: actor.id, name: actor.name, organization: actor.organization },
          actorRole: actor.role,
          comment,
          payload: {},
          at: new Date().toISOString(),
          hash: pendingTrailHash,
        };
        queryClient.setQueryData<RequestDetail>(key, { ...before, trail: [...before.trail, provisional] });
      }
      return { before };
    },
    onError: (_err, { id }, context) => {
      if (context?.before) queryClient.setQueryData(requestKeys.detail(id), context.before);
    },
    onSuccess: (detail) => settle(queryClient, detail),
  });
}

export function attachmentUrl(attachmentId: string, download = false): string {
  return `/api/attachments/${encodeURIComponent(attachmentId)}/content${download ? '?download=1' : ''}`;
}
