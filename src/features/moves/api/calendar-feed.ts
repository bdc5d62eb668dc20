import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** GET /api/calendar-feeds/me: whether the feed exists; its URL is never shown again. */
export interface CalendarFeedStatus {
  exists: boolean;
  createdAt: string | null;
  lastUsedAt: string | null;
  url: null;
}

/** POST /api/calendar-feeds/me/rotate: the only answer that holds the URL. */
export interface CalendarFeedLink {
  exists: true;
  path: string;
  url: string;
}

export const calendarFeedKeys = {
  all: ['calendar-feed'] as const,
  me: () => ['calendar-feed', 'me'] as const,
};

export const getCalendarFeed = () => api.get<CalendarFeedStatus>('/api/calendar-feeds/me');

export const getCalendarFeedQueryOptions = () =>
  queryOptions({ queryKey: calendarFeedKeys.me(), queryFn: getCalendarFeed });

export const useCalendarFeed = () => useQuery(getCalendarFeedQueryOptions());

export const rotateCalendarFeed = () => api.post<CalendarFeedLink>('/api/calendar-feeds/me/rotate');

/** Makes the feed, or replaces its link so the old one stops working. */
export function useRotateCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: rotateCalendarFeed,
    onSettled: () => queryClient.invalidateQueries({ queryKey: calendarFeedKeys.all }),
  });
}
