import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { HiveSetupCreateRequest } from '@shared/schemas/hive-setups';
import { api } from '@/lib/api-client';
import type { HiveSetup } from '../types';
import { settingsKeys } from './keys';

export interface UpdateHiveSetupInput {
  id: string;
  version: number;
  changes: Partial<HiveSetupCreateRequest>;
}

export const updateHiveSetup = ({ id, version, changes }: UpdateHiveSetupInput) =>
  api.patch<HiveSetup>(`/api/hive-setups/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateHiveSetup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateHiveSetup,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.hiveSetups }),
  });
}
