import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LoadSheet } from '../types';
import { moveKeys } from './keys';

/** The printable load sheet: the saved plan, or one computed now for moves saved without one. */
export const getLoadSheet = (id: string) =>
  api.get<LoadSheet>(`/api/moves/${encodeURIComponent(id)}/load-sheet`);

export const getLoadSheetQueryOptions = (id: string) =>
  queryOptions({ queryKey: moveKeys.loadSheet(id), queryFn: () => getLoadSheet(id) });

export const useLoadSheet = (id: string) => useQuery(getLoadSheetQueryOptions(id));
