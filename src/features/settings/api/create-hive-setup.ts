import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HiveSetupCreateRequest } from '@shared/schemas/hive-setups';
import { api } from '@/lib/api-client';
import type { HiveSetup } from '../types';
import { settingsKeys } from './keys';

export const createHiveSetup = (input: HiveSetupCreateRequest) =>
  api.post<HiveSetup>('/api/hive-setups', input);

export function useCreateHiveSetup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createHiveSetup,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.hiveSetups }),
  });
}
