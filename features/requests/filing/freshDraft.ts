// The request as the server has it now, whatever the cache holds: for deciding what to tell the
// person after a save or a filing was refused or its answer was lost.
import type { QueryClient } from '@tanstack/react-query';
import type { RequestDetail } from '../../../shared/requests/types';
import { apiFetch } from '../../api/http';
import { requestKeys } from '../api';

export function fetchFreshDetail(queryClient: QueryClient, id: string): Promise<RequestDetail> {
  return queryClient.fetchQuery({ queryKey: requestKeys.detail(id), queryFn: () => apiFetch<RequestDetail>(`/api/requests/${encodeURIComponent(id)}`), staleTime: 0 });
}
