import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { ColonyLot } from '../types';
import { settingsKeys } from './keys';

export const archiveColonyLot = ({ id, version }: { id: string; version: number }) =>
  api.post<ColonyLot>(`/api/colony-lots/${encodeURIComponent(id)}/archive`, { version });

/** Archives at once in the list; puts the row back if the server refuses. */
export function useArchiveColonyLot() {
  const queryClient = useQueryClient();
  const key = settingsKeys.colonyLotList();
  return useMutation({
    mutationFn: archiveColonyLot,
    onMutate: async ({ id }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<ListResult<ColonyLot>>(key);
      queryClient.setQueryData<ListResult<ColonyLot>>(key, (old) =>
        old ? { items: old.items.filter((r) => r.id !== id), total: old.total - 1 } : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.colonyLots }),
  });
}
