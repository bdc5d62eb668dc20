import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import type { Role, SessionUser } from '@shared/schemas/users';
import { sessionQueryOptions } from './auth';

/** A safe place to return to after sign-in: a path on this site, never another origin. */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-in'))
    return '/';
  return next;
}

/** The signed-in user, or a redirect to sign-in that comes back to `request`'s path. */
export async function requireUser(
  queryClient: QueryClient,
  request: Request,
): Promise<SessionUser> {
  const session = await queryClient.ensureQueryData(sessionQueryOptions());
  if (!session.user) {
    const url = new URL(request.url);
    throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
  }
  return session.user;
}

/** The signed-in user if their role is one of `roles`; others are sent to their home screen. */
export async function requireRole(
  queryClient: QueryClient,
  request: Request,
  roles: Role[],
): Promise<SessionUser> {
  const user = await requireUser(queryClient, request);
  if (!roles.includes(user.role)) throw redirect('/');
  return user;
}
