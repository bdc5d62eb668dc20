import type { DataSource } from 'typeorm';
import { addDays } from '../../../shared/domain/calendar-date';
import { isoWeekLabel, isoWeekStart } from '../../../shared/domain/iso-week';
import { computeSeasonBalance } from '../../../shared/domain/season-balance';
import type { Actor } from '../../middleware/authorise';

/** Contract statuses whose colonies the season must supply. */
export const demandingStatuses = ['offered', 'agreed', 'in-bloom'];
/**
 * A contract with no removal date is taken to keep its colonies 28 days after its delivery window
 * closes: almond bloom lasts about a month (UC Cooperative Extension, REFERENCES.md).
 */
export const DEFAULT_STAY_DAYS = 28;

interface ContractRow {
  id: string;
  grower_id: string;
  grower_name: string;
  site_ids: string[];
  crop: string;
  status: string;
  colonies_ordered: number;
  min_frames: number;
  average_frames: number | null;
  fee_per_colony_cents: number;
  delivery_start_on: string;
  delivery_end_on: string;
  removal_on: string | null;
}

/**
 * The season board: ISO weeks across, contracts and moves down, and the supply-vs-demand balance
 * by week (computeSeasonBalance). Crew get no money; growers never reach it.
 *
 * Supply is the operation's colonies per lot on `from` (the ledger, every place), graded by the
 * lot's mean frames of bees (a lot with none on record counts by number, not by strength), and
 * available for the whole period. Demand is every offered, agreed or in-bloom contract over its
 * delivery start to its removal date.
 */
export async function seasonBoard(db: DataSource, actor: Actor, from: string, to: string) {
  const contracts = (await db.query(
    `SELECT c.id, c.grower_id, g.name AS grower_name, c.site_ids, c.crop, c.status, c.colonies_ordered,
            c.min_frames, c.average_frames, c.fee_per_colony_cents,
            to_char(c.delivery_start_on, 'YYYY-MM-DD') AS delivery_start_on,
            to_char(c.delivery_end_on, 'YYYY-MM-DD') AS delivery_end_on,
            to_char(c.removal_on, 'YYYY-MM-DD') AS removal_on
       FROM contracts c JOIN growers g ON g.id = c.grower_id
      WHERE c.operation_id = $1 AND c.archived_at IS NULL
        AND c.delivery_start_on <= $3 AND COALESCE(c.removal_on, c.delivery_end_on + $4::int) >= $2
      ORDER BY c.delivery_start_on, g.name`,
    [actor.operationId, from, to, DEFAULT_STAY_DAYS],
  )) as ContractRow[];
  const moves = (await db.query(
    `SELECT m.id, m.name, to_char(m.night_of, 'YYYY-MM-DD') AS night_of, m.status, m.contract_id,
            m.destination_kind, m.destination_ids,
            (SELECT COALESCE(SUM(o.colonies), 0)::int FROM move_origins o WHERE o.move_id = m.id) AS colonies,
            (SELECT count(*)::int FROM move_loads l WHERE l.move_id = m.id) AS trucks
       FROM moves m
      WHERE m.operation_id = $1 AND m.archived_at IS NULL AND m.night_of BETWEEN $2 AND $3
      ORDER BY m.night_of, m.name`,
    [actor.operationId, from, to],
  )) as Array<{
    id: string;
    name: string;
    night_of: string;
    status: string;
    contract_id: string | null;
    destination_kind: string;
    destination_ids: string[];
    colonies: number;
    trucks: number;
  }>;
  const lots = (await db.query(
    `SELECT f.lot_id, l.name, l.mean_frames, SUM(f.delta)::int AS colonies
       FROM ledger_flows f
       JOIN colony_lots l ON l.id = f.lot_id
      WHERE f.operation_id = $1 AND f.occurred_on <= $2
      GROUP BY f.lot_id, l.name, l.mean_frames
     HAVING SUM(f.delta) > 0
      ORDER BY l.name`,
    [actor.operationId, from],
  )) as Array<{ lot_id: string; name: string; mean_frames: number | null; colonies: number }>;

  const removalOf = (c: ContractRow) =>
    c.removal_on ?? addDays(c.delivery_end_on, DEFAULT_STAY_DAYS);
  const weeks: Array<{ week: string; weekStart: string; weekEnd: string }> = [];
  for (let monday = isoWeekStart(from); monday <= to; monday = addDays(monday, 7)) {
    weeks.push({ week: isoWeekLabel(monday), weekStart: monday, weekEnd: addDays(monday, 6) });
  }
  const weeksTouched = (start: string, end: string) =>
    weeks.filter((w) => w.weekStart <= end && w.weekEnd >= start).map((w) => w.week);

  const balance = computeSeasonBalance({
    from,
    to,
    contracts: contracts
      .filter((c) => demandingStatuses.includes(c.status))
      .map((c) => ({
        id: c.id,
        colonies: c.colonies_ordered,
        minFramesOfBees: c.min_frames,
        deliveryDate: c.delivery_start_on,
        removalDate: removalOf(c),
      })),
    lots: lots.map((l) => ({
      id: l.lot_id,
      colonies: l.colonies,
      meanFramesOfBees: l.mean_frames ?? 0,
      availableFrom: isoWeekStart(from),
    })),
  });

  return {
    from,
    to,
    weeks,
    contracts: contracts.map((c) => ({
      id: c.id,
      growerId: c.grower_id,
      growerName: c.grower_name,
      siteIds: c.site_ids,
      crop: c.crop,
      status: c.status,
      countsTowardsDemand: demandingStatuses.includes(c.status),
      coloniesOrdered: c.colonies_ordered,
      minFrames: c.min_frames,
      averageFrames: c.average_frames,
      ...(actor.role === 'crew' ? {} : { feePerColonyCents: c.fee_per_colony_cents }),
      deliveryStartOn: c.delivery_start_on,
      deliveryEndOn: c.delivery_end_on,
      removalOn: c.removal_on,
      removalAssumed: c.removal_on === null,
      deliveryWeeks: weeksTouched(c.delivery_start_on, c.delivery_end_on),
      weeks: weeksTouched(c.delivery_start_on, removalOf(c)),
    })),
    moves: moves.map((m) => ({
      id: m.id,
      name: m.name,
      nightOf: m.night_of,
      week: isoWeekLabel(m.night_of),
      status: m.status,
      contractId: m.contract_id,
      destinationKind: m.destination_kind,
      destinationIds: m.destination_ids,
      colonies: m.colonies,
      trucks: m.trucks,
    })),
    supply: lots.map((l) => ({
      lotId: l.lot_id,
      lotName: l.name,
      colonies: l.colonies,
      meanFrames: l.mean_frames,
    })),
    balance,
    notes: [
      `Supply: colonies per lot on ${from} from the ledger, graded by each lot's mean frames of bees.`,
      `Demand: offered, agreed and in-bloom contracts from delivery start to removal (delivery end + ${DEFAULT_STAY_DAYS} days when no removal date is set).`,
    ],
  };
}
