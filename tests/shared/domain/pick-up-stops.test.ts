import { describe, expect, it } from 'vitest';
import { recordedAtStop, stopKey } from '../../../shared/domain/pick-up-stops';

const dryFork = { yardId: 'y-dry-fork', lotId: 'l-doubles' };
const saltLick = { yardId: 'y-salt-lick', lotId: 'l-singles' };
type Counted = typeof dryFork & { pallets: number };
const pallets = (c: Counted) => c.pallets;

describe('recordedAtStop', () => {
  it('when counts are kept per stop then each stop reads its own, and a stop left out reads null', () => {
    const byStop = [{ ...saltLick, pallets: 6 }];
    expect(recordedAtStop(byStop, 6, [dryFork, saltLick], saltLick, pallets)).toBe(6);
    expect(recordedAtStop(byStop, 6, [dryFork, saltLick], dryFork, pallets)).toBeNull();
  });

  it('when only a truck total is kept then it is the stop’s on a one-stop truck and nobody’s on a two-stop one', () => {
    expect(recordedAtStop<Counted>(null, 9, [dryFork], dryFork, pallets)).toBe(9);
    expect(recordedAtStop<Counted>(null, 9, [dryFork, saltLick], dryFork, pallets)).toBeNull();
  });

  it('when two lots are taken from one yard then they are two stops', () => {
    expect(stopKey(dryFork)).not.toBe(stopKey({ ...dryFork, lotId: 'l-singles' }));
  });
});
