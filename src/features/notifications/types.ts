/** An in-app notice for one staff user. */
export interface AppNotification {
  id: string;
  kind: string;
  title: string;
  body: string;
  relatedKind: 'contract' | 'spray-notice' | null;
  relatedId: string | null;
  createdAt: string;
  readAt: string | null;
}

export interface NotificationList {
  items: AppNotification[];
  total: number;
  unread: number;
}
