import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SprayNoticeAcknowledgeRequest } from '@shared/schemas/spray-notices';
import { api } from '@/lib/api-client';
import type { SprayNotice } from '../types';
import { sprayNoticeKeys } from './keys';

export const acknowledgeSprayNotice = (id: string, input: SprayNoticeAcknowledgeRequest) =>
  api.post<SprayNotice>(`/api/spray-notices/${id}/acknowledge`, input);

/** Acknowledges a notice with the action taken; the lists refresh after, also on a conflict. */
export function useAcknowledgeSprayNotice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: SprayNoticeAcknowledgeRequest & { id: string }) =>
      acknowledgeSprayNotice(id, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: sprayNoticeKeys.all }),
  });
}
