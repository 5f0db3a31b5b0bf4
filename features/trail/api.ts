// Queries for the auditor's trail: one key factory; the request itself and its chain check come from
// the requests feature (features/requests/api.ts), which owns those keys.
import { useInfiniteQuery } from '@tanstack/react-query';
import type { TrailSearchFilters, TrailSearchHit, TrailSearchPage } from '../../shared/trail/trailSearch';
import { apiFetch } from '../api/http';

export const trailKeys = {
  all: ['trail'] as const,
  searches: () => ['trail', 'search'] as const,
  search: (filters: TrailSearchFilters) => ['trail', 'search', filters] as const,
};

function searchPath(filters: TrailSearchFilters, cursor: string | undefined): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  if (cursor) params.set('cursor', cursor);
  const query = params.toString();
  return query ? `/api/trail/search?${query}` : '/api/trail/search';
}

// Most recent activity first; `items` is every page loaded so far.
export function useTrailSearch(filters: TrailSearchFilters) {
  const query = useInfiniteQuery({
    queryKey: trailKeys.search(filters),
    queryFn: ({ pageParam }) => apiFetch<TrailSearchPage>(searchPath(filters, pageParam)),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
    staleTime: 15_000,
  });
  const items: TrailSearchHit[] = query.data?.pages.flatMap((p) => p.items) ?? [];
  return { ...query, items };
}

const requestPath = (id: string) => `/api/requests/${encodeURIComponent(id)}`;
export const trailCsvUrl = (id: string) => `${requestPath(id)}/trail.csv`;
export const decisionRecordUrl = (id: string) => `${requestPath(id)}/decision-record.pdf`;
