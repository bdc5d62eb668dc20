import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SeasonBoard } from '../types';

export const seasonKeys = {
  all: ['season'] as const,
  board: (from: string, to: string) => [...seasonKeys.all, 'board', { from, to }] as const,
};

/** The season board for a period of at most 60 weeks. */
export const getSeason = (from: string, to: string) =>
  api.get<SeasonBoard>('/api/season', { query: { from, to } });

export const getSeasonQueryOptions = (from: string, to: string) =>
  queryOptions({ queryKey: seasonKeys.board(from, to), queryFn: () => getSeason(from, to) });

export const useSeason = (from: string, to: string) => useQuery(getSeasonQueryOptions(from, to));
