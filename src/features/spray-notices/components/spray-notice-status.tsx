import { Badge } from '@/components/ui/badge';
import type { SprayNotice } from '../types';
import { sprayActionLabels, sprayStatusLabels } from '../types';

/** Where a notice stands: waiting, or acknowledged with the beekeeper's action. */
export function SprayNoticeStatus({ notice }: { notice: SprayNotice }) {
  if (notice.archivedAt) return <Badge>Withdrawn</Badge>;
  if (notice.status === 'filed') return <Badge tone="amber">{sprayStatusLabels.filed}</Badge>;
  return (
    <span className="flex flex-col items-start gap-1">
      <Badge tone="green">{sprayStatusLabels.acknowledged}</Badge>
      {notice.action && <span className="text-sm">{sprayActionLabels[notice.action]}</span>}
    </span>
  );
}
