// The conditions list and the field confirmation of one condition. The move itself goes through
// the requests' workflow mutation; this adds refreshing the conditions list after it.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { ConditionListQuery } from '../../shared/conditions/listQuery';
import type { ConditionList } from '../../shared/conditions/types';
import { apiFetch } from '../api/http';
import { useWorkflowEvent } from '../requests/api';

export type ConditionStatus = ConditionListQuery['status'];

export const conditionKeys = {
  all: ['conditions'] as const,
  list: (status: ConditionStatus) => ['conditions', 'list', status] as const,
};

export function fetchConditionList(status: ConditionStatus): Promise<ConditionList> {
  return apiFetch<ConditionList>(`/api/conditions?status=${status}`);
}

export function useConditionList(status: ConditionStatus) {
  return useQuery({ queryKey: conditionKeys.list(status), queryFn: () => fetchConditionList(status), staleTime: 15_000 });
}

export function evidenceUploadUrl(requestId: string): string {
  return `/api/requests/${encodeURIComponent(requestId)}/attachments?purpose=condition_evidence`;
}

export type SatisfyInput = { requestId: string; version: number; conditionId: string; note: string; evidenceAttachmentId: string };

// Success or failure, the list is fetched again: on a 409 it shows what someone else has done.
export function useSatisfyCondition() {
  const queryClient = useQueryClient();
  const workflow = useWorkflowEvent();
  const { mutateAsync } = workflow;
  const satisfy = useCallback(
    async ({ requestId, version, conditionId, note, evidenceAttachmentId }: SatisfyInput) => {
      try {
        return await mutateAsync({ id: requestId, event: { type: 'satisfy_condition', version, conditionId, comment: note, evidenceAttachmentId } });
      } finally {
        await queryClient.invalidateQueries({ queryKey: conditionKeys.all });
      }
    },
    [mutateAsync, queryClient],
  );
  return { satisfy, isPending: workflow.isPending };
}
