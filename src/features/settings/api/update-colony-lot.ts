import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ColonyLotCreateRequest } from '@shared/schemas/colony-lots';
import { api } from '@/lib/api-client';
import type { ColonyLot } from '../types';
import { settingsKeys } from './keys';

export interface UpdateColonyLotInput {
  id: string;
  version: number;
  changes: Partial<ColonyLotCreateRequest>;
}

export const updateColonyLot = ({ id, version, changes }: UpdateColonyLotInput) =>
  api.patch<ColonyLot>(`/api/colony-lots/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateColonyLot() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateColonyLot,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.colonyLots }),
  });
}
