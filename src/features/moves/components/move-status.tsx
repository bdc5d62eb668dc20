import type { MoveStatus } from '@shared/schemas/moves';
import { Badge } from '@/components/ui/badge';

export const moveStatusLabels: Record<MoveStatus, string> = {
  draft: 'Draft',
  planned: 'Planned',
  loading: 'Loading',
  rolling: 'Rolling',
  placed: 'Placed',
  closed: 'Closed',
  cancelled: 'Cancelled',
};

const tones: Record<MoveStatus, 'neutral' | 'amber' | 'green' | 'red'> = {
  draft: 'neutral',
  planned: 'amber',
  loading: 'amber',
  rolling: 'amber',
  placed: 'green',
  closed: 'neutral',
  cancelled: 'red',
};

/** A move's status as a badge. */
export function MoveStatusBadge({ status }: { status: MoveStatus }) {
  return <Badge tone={tones[status]}>{moveStatusLabels[status]}</Badge>;
}
