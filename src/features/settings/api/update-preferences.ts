import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionUser, Units } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { sessionKeys, type SessionResponse } from '@/lib/auth';

export const updatePreferences = (input: { units: Units }) =>
  api.put<{ user: SessionUser }>('/api/session/preferences', input);

/** Saves the unit preference; every screen switches units at once and back on failure. */
export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onMutate: async ({ units }) => {
      await queryClient.cancelQueries({ queryKey: sessionKeys.all });
      const previous = queryClient.getQueryData<SessionResponse>(sessionKeys.all);
      if (previous?.user)
        queryClient.setQueryData<SessionResponse>(sessionKeys.all, {
          ...previous,
          user: { ...previous.user, units },
        });
      return { previous };
    },
    onError: (_error, _input, context) =>
      queryClient.setQueryData(sessionKeys.all, context?.previous),
    onSuccess: ({ user }) =>
      queryClient.setQueryData<SessionResponse>(sessionKeys.all, (old) =>
        old ? { ...old, user } : old,
      ),
  });
}
