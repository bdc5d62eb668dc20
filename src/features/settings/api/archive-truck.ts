import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { Truck } from '../types';
import { settingsKeys } from './keys';

export const archiveTruck = ({ id, version }: { id: string; version: number }) =>
  api.post<Truck>(`/api/trucks/${encodeURIComponent(id)}/archive`, { version });

/** Archives at once in the list; puts the row back if the server refuses. */
export function useArchiveTruck() {
  const queryClient = useQueryClient();
  const key = settingsKeys.truckList();
  return useMutation({
    mutationFn: archiveTruck,
    onMutate: async ({ id }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<ListResult<Truck>>(key);
      queryClient.setQueryData<ListResult<Truck>>(key, (old) =>
        old ? { items: old.items.filter((r) => r.id !== id), total: old.total - 1 } : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.trucks }),
  });
}
