import { EmptyState } from '@/components/ui/empty-state';
import { formatWindow } from '../local-instant';
import type { SprayNotice } from '../types';
import { SprayNoticeStatus } from './spray-notice-status';

/** A grower's own notices, newest first, with what the beekeeper did about each. */
export function GrowerSprayNotices({
  notices,
  siteName,
}: {
  notices: SprayNotice[];
  siteName: (id: string) => string;
}) {
  if (notices.length === 0)
    return <EmptyState title="No spray notices yet">Notices you file are listed here.</EmptyState>;
  return (
    <ul className="flex flex-col divide-y divide-dusk-700" aria-label="Your spray notices">
      {notices.map((notice) => (
        <li key={notice.id} className="flex flex-wrap items-start justify-between gap-3 py-3">
          <div>
            <p className="font-medium text-dusk-50">
              {notice.product} · {siteName(notice.siteId)}
            </p>
            <p className="text-sm text-dusk-300">{formatWindow(notice.startsAt, notice.endsAt)}</p>
            {notice.notes && <p className="mt-1 text-sm text-dusk-200">{notice.notes}</p>}
          </div>
          <SprayNoticeStatus notice={notice} />
        </li>
      ))}
    </ul>
  );
}
