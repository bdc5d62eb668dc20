import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  splitLeftAndLost,
  type OriginColonies,
  type TruckLeftAndLost,
} from '../../../shared/domain/placement-split';

const dryFork: OriginColonies = { yardId: 'y-dry-fork', lotId: 'l-doubles', colonies: 40 };
const saltLick: OriginColonies = { yardId: 'y-salt-lick', lotId: 'l-singles', colonies: 20 };
const stopOf = ({ yardId, lotId }: OriginColonies) => ({ yardId, lotId });

const truck = (fields: Partial<TruckLeftAndLost>): TruckLeftAndLost => ({
  coloniesLeftBehind: null,
  leftBehindByStop: null,
  coloniesLost: null,
  stops: [stopOf(dryFork), stopOf(saltLick)],
  ...fields,
});

describe('splitLeftAndLost', () => {
  it('when colonies are left behind per stop then each stays in the yard it was left in', () => {
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [
        truck({
          coloniesLeftBehind: 3,
          leftBehindByStop: [
            { ...stopOf(dryFork), colonies: 3 },
            { ...stopOf(saltLick), colonies: 0 },
          ],
        }),
      ],
    );
    expect(split).toEqual({ ok: true, leftBehind: [3, 0], lost: [0, 0] });
  });

  it('when a one-stop truck records a bare total then it stays at that stop, not shared out', () => {
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [truck({ coloniesLeftBehind: 4, stops: [stopOf(saltLick)] })],
    );
    expect(split).toEqual({ ok: true, leftBehind: [0, 4], lost: [0, 0] });
  });

  it('when a two-stop truck records only a bare total then it is shared 40 : 20 by largest remainder', () => {
    // 3 × 40/60 = 2, 3 × 20/60 = 1 (exact).
    const split = splitLeftAndLost([dryFork, saltLick], [truck({ coloniesLeftBehind: 3 })]);
    expect(split).toEqual({ ok: true, leftBehind: [2, 1], lost: [0, 0] });
  });

  it('when a stop counted is no longer an origin of the move then its colonies are shared out, not dropped', () => {
    const gone = { yardId: 'y-gone', lotId: 'l-doubles' };
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [truck({ coloniesLeftBehind: 3, leftBehindByStop: [{ ...gone, colonies: 3 }] })],
    );
    expect(split).toEqual({ ok: true, leftBehind: [2, 1], lost: [0, 0] });
  });

  it('when colonies are lost on the road then the loss is shared over what was not left behind', () => {
    // After 20 left at Dry Fork both send 20, so 6 lost split 3 : 3.
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [
        truck({
          coloniesLeftBehind: 20,
          leftBehindByStop: [{ ...stopOf(dryFork), colonies: 20 }],
          coloniesLost: 6,
        }),
      ],
    );
    expect(split).toEqual({ ok: true, leftBehind: [20, 0], lost: [3, 3] });
  });

  it('when more are left behind at one yard than the move takes from it then it names that origin', () => {
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [truck({ leftBehindByStop: [{ ...stopOf(saltLick), colonies: 25 }] })],
    );
    expect(split).toEqual({ ok: false, origin: 1, leftBehind: 25 });
  });

  it('when left behind and lost together exceed the move then it refuses with the totals', () => {
    const split = splitLeftAndLost(
      [dryFork, saltLick],
      [truck({ coloniesLeftBehind: 50, coloniesLost: 11 })],
    );
    expect(split).toEqual({ ok: false, leftBehind: 50, lost: 11, total: 60 });
  });

  it('when trucks record at random then no origin gives more than it sends and the totals are kept (fast-check)', () => {
    const origins = [dryFork, saltLick, { yardId: 'y-cinder', lotId: 'l-doubles', colonies: 9 }];
    const count = fc.option(fc.nat(30), { nil: null });
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            coloniesLeftBehind: count,
            coloniesLost: count,
            byStop: fc.option(fc.tuple(fc.nat(12), fc.nat(12), fc.nat(5)), { nil: null }),
            stops: fc.subarray(origins.map(stopOf), { minLength: 1 }),
          }),
          { maxLength: 4 },
        ),
        (records) => {
          const trucks: TruckLeftAndLost[] = records.map((r) => {
            const leftBehindByStop = r.byStop
              ? r.stops.map((s, i) => ({ ...s, colonies: r.byStop![i] }))
              : null;
            return {
              coloniesLeftBehind: leftBehindByStop
                ? leftBehindByStop.reduce((sum, c) => sum + c.colonies, 0)
                : r.coloniesLeftBehind,
              leftBehindByStop,
              coloniesLost: r.coloniesLost,
              stops: r.stops,
            };
          });
          const split = splitLeftAndLost(origins, trucks);
          if (!split.ok) return;
          const left = trucks.reduce((sum, t) => sum + (t.coloniesLeftBehind ?? 0), 0);
          const lost = trucks.reduce((sum, t) => sum + (t.coloniesLost ?? 0), 0);
          expect(split.leftBehind.reduce((a, b) => a + b, 0)).toBe(left);
          expect(split.lost.reduce((a, b) => a + b, 0)).toBe(lost);
          origins.forEach((o, i) =>
            expect(split.leftBehind[i] + split.lost[i]).toBeLessThanOrEqual(o.colonies),
          );
        },
      ),
    );
  });
});
