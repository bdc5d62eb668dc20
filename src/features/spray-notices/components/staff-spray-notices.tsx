import { EmptyState } from '@/components/ui/empty-state';
import { formatDateTime } from '@/lib/units';
import { formatWindow } from '../local-instant';
import type { SprayNotice } from '../types';
import { AcknowledgeForm } from './acknowledge-form';
import { SprayNoticeStatus } from './spray-notice-status';

interface StaffSprayNoticesProps {
  notices: SprayNotice[];
  siteName: (id: string) => string;
  growerName: (id: string) => string;
  /** Owners and planners acknowledge; crew only read. */
  canAcknowledge: boolean;
}

/** Every notice of the operation, the unanswered ones first, each with its acknowledgement. */
export function StaffSprayNotices({
  notices,
  siteName,
  growerName,
  canAcknowledge,
}: StaffSprayNoticesProps) {
  if (notices.length === 0)
    return (
      <EmptyState title="No spray notices">
        When a grower files a notice of a planned spray, it shows here.
      </EmptyState>
    );
  const ordered = [...notices].sort(
    (a, b) =>
      Number(a.status !== 'filed') - Number(b.status !== 'filed') ||
      a.startsAt.localeCompare(b.startsAt),
  );
  return (
    <ul className="flex flex-col gap-3" aria-label="Spray notices">
      {ordered.map((notice) => (
        <li
          key={notice.id}
          data-notice={notice.product}
          className="grid grid-cols-1 gap-4 rounded-lg bg-dusk-850 p-4 ring-1 ring-dusk-700 md:grid-cols-[1fr_18rem]"
        >
          <div className="flex flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2">
              <h2 className="text-lg font-semibold text-dusk-50">{notice.product}</h2>
              <SprayNoticeStatus notice={notice} />
            </div>
            <p>
              <span className="text-dusk-300">Site </span>
              {siteName(notice.siteId)}
              <span className="text-dusk-300"> · Grower </span>
              {growerName(notice.growerId)}
            </p>
            <p>
              <span className="text-dusk-300">Spraying </span>
              {formatWindow(notice.startsAt, notice.endsAt)}
            </p>
            {notice.notes && <p className="text-dusk-200">{notice.notes}</p>}
            <p className="text-sm text-dusk-400">Filed {formatDateTime(notice.createdAt)}</p>
            {notice.actionNote && (
              <p className="text-sm text-dusk-200">
                <span className="text-dusk-300">Internal note: </span>
                {notice.actionNote}
              </p>
            )}
          </div>
          {canAcknowledge && notice.status === 'filed' && !notice.archivedAt && (
            <AcknowledgeForm notice={notice} />
          )}
        </li>
      ))}
    </ul>
  );
}
