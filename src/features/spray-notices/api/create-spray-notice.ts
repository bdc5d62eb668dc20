import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SprayNoticeCreateRequest } from '@shared/schemas/spray-notices';
import { api } from '@/lib/api-client';
import type { SprayNotice } from '../types';
import { sprayNoticeKeys } from './keys';

export const createSprayNotice = (input: SprayNoticeCreateRequest) =>
  api.post<SprayNotice>('/api/spray-notices', input);

/** Files a spray notice; the lists refresh after. */
export function useCreateSprayNotice() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSprayNotice,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sprayNoticeKeys.all }),
  });
}
