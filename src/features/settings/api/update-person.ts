import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import type { UserUpdateRequest } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import type { Person } from '../types';
import { settingsKeys } from './keys';

export const updatePerson = ({ id, ...changes }: UserUpdateRequest & { id: string }) =>
  api.patch<Person>(`/api/users/${encodeURIComponent(id)}`, changes);

/** Changes a role or deactivates; the row shows the change at once and reverts on refusal. */
export function useUpdatePerson() {
  const queryClient = useQueryClient();
  const key = settingsKeys.peopleList();
  return useMutation({
    mutationFn: updatePerson,
    onMutate: async ({ id, version: _version, ...changes }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<ListResult<Person>>(key);
      queryClient.setQueryData<ListResult<Person>>(key, (old) =>
        old
          ? {
              ...old,
              items: old.items.map((p) => (p.id === id ? ({ ...p, ...changes } as Person) : p)),
            }
          : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.people }),
  });
}
