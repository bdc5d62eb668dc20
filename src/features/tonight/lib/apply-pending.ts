import type { MoveStatus } from '@shared/schemas/moves';
import type { TonightMove } from '../types';
import type { QueuedChange } from './storage';

/** Tonight as the crew left it: the last snapshot with their waiting changes laid over it. */
export function applyPending(moves: TonightMove[], changes: QueuedChange[]): TonightMove[] {
  const waiting = changes.filter((c) => c.state === 'waiting');
  if (waiting.length === 0) return moves;
  return moves.map((move) => {
    let next = move;
    for (const change of waiting) {
      if (change.moveId !== move.id) continue;
      if (change.kind === 'status') {
        next = { ...next, status: change.payload.status as MoveStatus };
      } else if (change.kind === 'load-counts') {
        next = {
          ...next,
          loads: next.loads.map((load) =>
            load.loadId === change.loadId
              ? { ...load, recorded: { ...load.recorded, ...change.payload } }
              : load,
          ),
        };
      }
    }
    return next;
  });
}

/** "N changes waiting to send". */
export const waitingLabel = (count: number) =>
  count === 1 ? '1 change waiting to send' : `${count} changes waiting to send`;
