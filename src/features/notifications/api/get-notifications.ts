import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { NotificationList } from '../types';
import { notificationKeys } from './keys';

/** The newest 20 notifications and the unread count. */
export const getNotifications = () =>
  api.get<NotificationList>('/api/notifications', { query: { limit: 20 } });

export const getNotificationsQueryOptions = () =>
  queryOptions({ queryKey: notificationKeys.list(), queryFn: getNotifications });

/** Polls once a minute while the app is open (no toast: the count simply changes). */
export const useNotifications = (enabled: boolean) =>
  useQuery({ ...getNotificationsQueryOptions(), enabled, refetchInterval: 60_000 });
