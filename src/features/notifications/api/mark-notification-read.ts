import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AppNotification } from '../types';
import { notificationKeys } from './keys';

export const markNotificationRead = (id: string) =>
  api.post<AppNotification>(`/api/notifications/${id}/read`);

/** Marks one notification read; the count refreshes after. */
export function useMarkNotificationRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markNotificationRead,
    onSettled: () => queryClient.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}
