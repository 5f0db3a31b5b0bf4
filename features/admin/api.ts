// Queries and mutations of the administrator's screens: one key factory; every change refreshes
// what it can have touched (a membership shows on both the person and the project).
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InviteInput, PersonUpdate, ProjectSettings } from '../../shared/people/schemas';
import type { AdminProject, PendingInvitation, PersonRow } from '../../shared/people/types';
import { apiFetch } from '../api/http';
import { actorKey } from '../auth/useActor';

export const adminKeys = {
  all: ['admin'] as const,
  people: () => ['admin', 'people'] as const,
  projects: () => ['admin', 'projects'] as const,
  invitations: () => ['admin', 'invitations'] as const,
};

const id = (value: string) => encodeURIComponent(value);

function send<T>(path: string, method: 'POST' | 'PATCH' | 'DELETE', body?: unknown): Promise<T> {
  return apiFetch<T>(path, {
    method,
    headers: body === undefined ? undefined : { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

export function usePeople() {
  return useQuery({ queryKey: adminKeys.people(), queryFn: () => apiFetch<PersonRow[]>('/api/admin/people'), staleTime: 30_000 });
}

export function useAdminProjects() {
  return useQuery({ queryKey: adminKeys.projects(), queryFn: () => apiFetch<AdminProject[]>('/api/admin/projects'), staleTime: 30_000 });
}

export function useInvitations() {
  return useQuery({ queryKey: adminKeys.invitations(), queryFn: () => apiFetch<PendingInvitation[]>('/api/admin/invitations'), staleTime: 30_000 });
}

// People and projects both show memberships and roles, so a change to either refreshes both.
function useRefreshAll() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: adminKeys.all });
}

export function useChangePerson() {
  const queryClient = useQueryClient();
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: ({ personId, update }: { personId: string; update: PersonUpdate }) => send<PersonRow>(`/api/admin/people/${id(personId)}`, 'PATCH', update),
    // The administrator's own organization shows in the bar.
    onSuccess: () => Promise.all([refresh(), queryClient.invalidateQueries({ queryKey: actorKey })]),
  });
}

export function useInvite() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: (input: InviteInput) => send<PendingInvitation>('/api/admin/invitations', 'POST', input),
    onSuccess: refresh,
  });
}

export function useResendInvitation() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: (invitationId: string) => send<PendingInvitation>(`/api/admin/invitations/${id(invitationId)}/resend`, 'POST'),
    onSuccess: refresh,
  });
}

export function useWithdrawInvitation() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: (invitationId: string) => send<void>(`/api/admin/invitations/${id(invitationId)}`, 'DELETE'),
    onSuccess: refresh,
  });
}

export function useAddMember() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: ({ projectId, userId }: { projectId: string; userId: string }) => send<AdminProject>(`/api/admin/projects/${id(projectId)}/members`, 'POST', { userId }),
    onSuccess: refresh,
  });
}

export function useRemoveMember() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: ({ projectId, userId }: { projectId: string; userId: string }) => send<AdminProject>(`/api/admin/projects/${id(projectId)}/members/${id(userId)}`, 'DELETE'),
    onSuccess: refresh,
  });
}

export function useSaveProjectSettings() {
  const refresh = useRefreshAll();
  return useMutation({
    mutationFn: ({ projectId, settings }: { projectId: string; settings: ProjectSettings }) => send<AdminProject>(`/api/admin/projects/${id(projectId)}`, 'PATCH', settings),
    onSuccess: refresh,
  });
}
