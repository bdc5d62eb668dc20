import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ColonyLotCreateRequest } from '@shared/schemas/colony-lots';
import { api } from '@/lib/api-client';
import type { ColonyLot } from '../types';
import { settingsKeys } from './keys';

export const createColonyLot = (input: ColonyLotCreateRequest) =>
  api.post<ColonyLot>('/api/colony-lots', input);

export function useCreateColonyLot() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createColonyLot,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.colonyLots }),
  });
}
