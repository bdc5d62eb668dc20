import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResult } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import type { HiveSetup } from '../types';
import { settingsKeys } from './keys';

export const getHiveSetups = () =>
  api.get<ListResult<HiveSetup>>('/api/hive-setups', { query: { limit: 500 } });

export const getHiveSetupsQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.hiveSetupList(), queryFn: getHiveSetups });

export const useHiveSetups = () => useQuery(getHiveSetupsQueryOptions());
