import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TruckCreateRequest } from '@shared/schemas/trucks';
import { api } from '@/lib/api-client';
import type { Truck } from '../types';
import { settingsKeys } from './keys';

export const createTruck = (input: TruckCreateRequest) => api.post<Truck>('/api/trucks', input);

export function useCreateTruck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTruck,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: settingsKeys.trucks }),
  });
}
