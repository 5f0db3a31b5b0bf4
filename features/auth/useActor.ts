// Who is signed in, with the role and organization Spanrelay keeps on the account.
import { useEffect } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Actor } from '../../shared/requests/types';
import { apiFetch, ApiError } from '../api/http';
import { loadAuthClient } from './loadAuthClient';

export const actorKey = ['actor'] as const;

export const actorQuery = {
  queryKey: actorKey,
  queryFn: async (): Promise<Actor | null> => {
    try {
      return await apiFetch<Actor>('/api/me');
    } catch (err) {
      if (err instanceof ApiError && err.status === 401) return null;
      throw err;
    }
  },
  staleTime: 60_000,
};

export function useActor() {
  return useQuery(actorQuery);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  // Fetched while the e-mail and password are typed, so the button does not wait for it.
  useEffect(() => {
    loadAuthClient('').catch(() => undefined);
  }, []);
  return useMutation({
    mutationFn: async (input: { email: string; password: string }) => {
      const authClient = await loadAuthClient(signInMessage(0, undefined));
      const { error } = await authClient.signIn.email(input);
      if (error) throw new ApiError(error.status, error.code ?? 'sign_in_failed', signInMessage(error.status, error.message));
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: actorKey }),
  });
}

function signInMessage(status: number, message: string | undefined): string {
  if (status === 401) return 'That e-mail and password do not match an account.';
  if (status === 429) return message || 'Too many failed sign-ins; wait and try again.';
  return message || 'Signing in failed; try again.';
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      const authClient = await loadAuthClient('Signing out failed; try again.');
      await authClient.signOut();
    },
    onSuccess: () => {
      queryClient.clear();
    },
  });
}
