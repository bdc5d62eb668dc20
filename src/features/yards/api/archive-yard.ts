import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import type { YardView } from '@shared/schemas/yards';
import { api } from '@/lib/api-client';
import { yardKeys } from './keys';

export const archiveYard = ({ id, version }: { id: string; version: number }) =>
  api.post<YardView>(`/api/yards/${encodeURIComponent(id)}/archive`, { version });

/** Archives a yard; it leaves the list at once and comes back if the server refuses. */
export function useArchiveYard() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveYard,
    onMutate: async ({ id }) => {
      await queryClient.cancelQueries({ queryKey: yardKeys.lists() });
      const previous = queryClient.getQueriesData<ListResult<YardView>>({
        queryKey: yardKeys.lists(),
      });
      queryClient.setQueriesData<ListResult<YardView>>({ queryKey: yardKeys.lists() }, (old) =>
        old ? { items: old.items.filter((y) => y.id !== id), total: old.total - 1 } : old,
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      for (const [key, data] of context?.previous ?? []) queryClient.setQueryData(key, data);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: yardKeys.all }),
  });
}
