import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { getCalendarFeedQueryOptions } from '@/features/moves/api/calendar-feed';
import { CalendarFeedPanel } from '@/features/moves/components/calendar-feed-panel';
import { requireRole } from '@/lib/route-guards';

export const loader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireRole(queryClient, request, ['owner', 'planner', 'crew']);
    void queryClient.prefetchQuery(getCalendarFeedQueryOptions());
    return null;
  };

/** /settings/calendar: the user's private iCalendar link of moves. */
export function CalendarFeedRoute() {
  return <CalendarFeedPanel />;
}
