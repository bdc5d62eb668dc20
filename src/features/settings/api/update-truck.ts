import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TruckCreateRequest } from '@shared/schemas/trucks';
import { api } from '@/lib/api-client';
import type { Truck } from '../types';
import { settingsKeys } from './keys';

export interface UpdateTruckInput {
  id: string;
  version: number;
  changes: Partial<TruckCreateRequest>;
}

export const updateTruck = ({ id, version, changes }: UpdateTruckInput) =>
  api.patch<Truck>(`/api/trucks/${encodeURIComponent(id)}`, { ...changes, version });

export function useUpdateTruck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTruck,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.trucks }),
  });
}
