// The request cache's keys, and how a changed request is put into it. Kept apart from the hooks so
// it needs nothing of the browser.
import type { QueryClient } from '@tanstack/react-query';
import type { RequestFilterQuery, RequestListQuery } from '../../shared/requests/listQuery';
import type { RequestDetail } from '../../shared/requests/types';

export type RequestListFilters = Omit<Partial<RequestListQuery>, 'cursor'>;
export type RequestCountFilters = Partial<RequestFilterQuery>;
export type PersonOption = { id: string; name: string; email: string; organization: string | null };
export type TrailCheck = { ok: true; events: number } | { ok: false; brokenAt: number };

export const requestKeys = {
  all: ['requests'] as const,
  lists: () => ['requests', 'list'] as const,
  list: (filters: RequestListFilters) => ['requests', 'list', filters] as const,
  // Under 'list', so whatever makes the lists stale makes the counts stale too.
  counts: (filters: RequestCountFilters) => ['requests', 'list', 'counts', filters] as const,
  detail: (id: string) => ['requests', 'detail', id] as const,
  engineersOfRecord: (id: string) => ['requests', 'detail', id, 'engineers-of-record'] as const,
  trailCheck: (id: string) => ['requests', 'detail', id, 'trail-check'] as const,
  projects: ['projects'] as const,
};

// A changed request may move between desks, so every list is stale; the detail we already hold.
// A read of the detail still in flight was asked before this answer and would overwrite it with the
// older state, so it is cancelled first.
export async function settle(queryClient: QueryClient, detail: RequestDetail) {
  await queryClient.cancelQueries({ queryKey: requestKeys.detail(detail.id), exact: true });
  queryClient.setQueryData(requestKeys.detail(detail.id), detail);
  await queryClient.invalidateQueries({ queryKey: requestKeys.lists() });
}
