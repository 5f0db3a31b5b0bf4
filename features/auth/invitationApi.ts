// The invited person's two calls, made before they can sign in.
import { useMutation, useQuery } from '@tanstack/react-query';
import type { AcceptInvitationInput } from '../../shared/people/schemas';
import type { InvitationPreview } from '../../shared/people/types';
import { apiFetch } from '../api/http';

export const invitationKeys = {
  all: ['invitation'] as const,
  preview: (token: string) => ['invitation', 'preview', token] as const,
};

const post = <T,>(path: string, body: unknown) => apiFetch<T>(path, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });

export function useInvitationPreview(token: string | undefined) {
  return useQuery({
    queryKey: invitationKeys.preview(token ?? ''),
    queryFn: () => post<InvitationPreview>('/api/invitations/preview', { token }),
    enabled: !!token,
    staleTime: Infinity,
  });
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: (input: AcceptInvitationInput) => post<{ email: string }>('/api/invitations/accept', input) });
}
