import { formatDate } from '@/lib/units';
import type { Proposal } from '../types';

/** The grower's latest answer, while the beekeeper has not yet replied to a counter. */
export function AnsweredProposal({ proposal }: { proposal: Proposal }) {
  if (proposal.status !== 'countered' || !proposal.counter) return null;
  return (
    <p className="rounded-md bg-dusk-900 px-3 py-2 text-sm text-dusk-200">
      You proposed {formatDate(proposal.counter.deliveryStartOn)} –{' '}
      {formatDate(proposal.counter.deliveryEndOn)}
      {proposal.counter.colonies ? ` for ${proposal.counter.colonies} colonies` : ''}. The beekeeper
      will answer with new dates.
    </p>
  );
}
