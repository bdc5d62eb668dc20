import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { ColonyLot } from '../types';
import { settingsKeys } from './keys';

export const getColonyLots = () =>
  api.get<ListResult<ColonyLot>>('/api/colony-lots', { query: { limit: 500 } });

export const getColonyLotsQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.colonyLotList(), queryFn: getColonyLots });

export const useColonyLots = () => useQuery(getColonyLotsQueryOptions());
