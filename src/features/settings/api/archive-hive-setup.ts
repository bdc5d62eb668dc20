import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { HiveSetup } from '../types';
import { settingsKeys } from './keys';

export const archiveHiveSetup = ({ id, version }: { id: string; version: number }) =>
  api.post<HiveSetup>(`/api/hive-setups/${encodeURIComponent(id)}/archive`, { version });

/** Archives at once in the list; puts the row back if the server refuses. */
export function useArchiveHiveSetup() {
  const queryClient = useQueryClient();
  const key = settingsKeys.hiveSetupList();
  return useMutation({
    mutationFn: archiveHiveSetup,
    onMutate: async ({ id }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<ListResult<HiveSetup>>(key);
      queryClient.setQueryData<ListResult<HiveSetup>>(key, (old) =>
        old ? { items: old.items.filter((r) => r.id !== id), total: old.total - 1 } : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: settingsKeys.hiveSetups }),
  });
}
