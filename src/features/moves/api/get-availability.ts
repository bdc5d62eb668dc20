import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Availability } from '../types';
import { moveKeys } from './keys';

/** Colonies per yard and lot on a night: in the ledger, promised to other moves, free. */
export const getAvailability = (nightOf: string, exceptMoveId?: string) =>
  api.get<Availability>('/api/moves/availability', { query: { nightOf, exceptMoveId } });

export const getAvailabilityQueryOptions = (nightOf: string, exceptMoveId?: string) =>
  queryOptions({
    queryKey: moveKeys.availability(nightOf, exceptMoveId),
    queryFn: () => getAvailability(nightOf, exceptMoveId),
  });

export const useAvailability = (nightOf: string, exceptMoveId?: string) =>
  useQuery({ ...getAvailabilityQueryOptions(nightOf, exceptMoveId), enabled: Boolean(nightOf) });
