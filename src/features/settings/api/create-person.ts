import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserCreateRequest } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import type { Person } from '../types';
import { settingsKeys } from './keys';

/** Invites a person: creates their account with a first password the owner passes on. */
export const createPerson = (input: UserCreateRequest) => api.post<Person>('/api/users', input);

export function useCreatePerson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPerson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.people }),
  });
}
