import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { formatDateTime } from '@/lib/units';
import { useNotifications } from '../api/get-notifications';
import { useMarkNotificationRead } from '../api/mark-notification-read';

/** The header's count of unread notifications, opening a short list with mark-as-read. */
export function NotificationsIndicator({ enabled }: { enabled: boolean }) {
  const { data } = useNotifications(enabled);
  const markRead = useMarkNotificationRead();
  const [open, setOpen] = useState(false);
  const panelId = useId();
  if (!enabled || !data) return null;
  const unread = data.unread;
  return (
    <div className="relative">
      <Button
        variant="ghost"
        size="sm"
        aria-expanded={open}
        aria-controls={panelId}
        aria-label={`Notifications, ${unread} unread`}
        onClick={() => setOpen((o) => !o)}
      >
        <svg viewBox="0 0 24 24" aria-hidden="true" className="h-5 w-5 fill-none stroke-current">
          <path
            strokeWidth={1.8}
            strokeLinecap="round"
            strokeLinejoin="round"
            d="M6 16V11a6 6 0 0 1 12 0v5l1.5 2h-15L6 16Zm4 4a2 2 0 0 0 4 0"
          />
        </svg>
        <span
          className={cx(
            'rounded-full px-2 text-sm',
            unread > 0 ? 'bg-ember-400 text-ember-900' : 'bg-dusk-700 text-dusk-200',
          )}
        >
          {unread}
        </span>
      </Button>
      {open && (
        <div
          id={panelId}
          className="absolute right-0 z-40 mt-2 w-80 max-w-[calc(100vw-2rem)] rounded-lg bg-dusk-850 p-3 shadow-lg ring-1 ring-dusk-700"
        >
          {data.items.length === 0 ? (
            <p className="text-dusk-300">Nothing new.</p>
          ) : (
            <ul className="flex max-h-96 flex-col divide-y divide-dusk-700 overflow-y-auto">
              {data.items.map((n) => (
                <li key={n.id} className="py-2">
                  <p className={cx('font-medium', n.readAt ? 'text-dusk-300' : 'text-dusk-50')}>
                    {n.title}
                  </p>
                  <p className="text-sm text-dusk-200">{n.body}</p>
                  <div className="mt-1 flex items-center justify-between gap-2">
                    <span className="text-xs text-dusk-400">{formatDateTime(n.createdAt)}</span>
                    {!n.readAt && (
                      <Button
                        size="sm"
                        variant="secondary"
                        busy={markRead.isPending && markRead.variables === n.id}
                        onClick={() => markRead.mutate(n.id)}
                      >
                        Mark read
                      </Button>
                    )}
                  </div>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
