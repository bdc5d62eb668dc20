import { queryOptions, useMutation, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import type { SessionUser, Units } from '@shared/schemas/users';
import { api } from './api-client';

/** What GET /api/session answers. */
export interface SessionResponse {
  user: SessionUser | null;
  csrfToken: string;
}

export const sessionKeys = { all: ['session'] as const };

export const getSession = () => api.get<SessionResponse>('/api/session');

/** The session: who is signed in (or null). Kept fresh by sign-in, sign-out and preferences. */
export const sessionQueryOptions = () =>
  queryOptions({ queryKey: sessionKeys.all, queryFn: getSession, staleTime: 5 * 60_000 });

/** The signed-in user; only used below the signed-in layout, whose loader ensures one. */
export function useUser(): SessionUser {
  const { data } = useSuspenseQuery(sessionQueryOptions());
  if (!data.user) throw new Error('No one is signed in.');
  return data.user;
}

/** The user's chosen units (imperial or metric). */
export function useUnits(): Units {
  return useUser().units;
}

export interface SignInInput {
  email: string;
  password: string;
}

/** Signs in; the session query then holds the new user and token. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<SessionResponse>('/api/session', input),
    onSuccess: (session) => {
      queryClient.clear();
      queryClient.setQueryData(sessionKeys.all, session);
    },
  });
}

/** Signs out and forgets every cached record. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>('/api/session'),
    onSettled: () => {
      queryClient.clear();
    },
  });
}

/** True when the role may edit yards, sites, growers, contracts and the ledger. */
export const canPlan = (user: SessionUser) => user.role === 'owner' || user.role === 'planner';

/** True for the operation's own people (owner, planner, crew): they weigh hives and inspect colonies. */
export const isStaff = (user: SessionUser) =>
  user.role === 'owner' || user.role === 'planner' || user.role === 'crew';
