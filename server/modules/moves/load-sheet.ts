import type { DataSource } from 'typeorm';
import type { Actor } from '../../middleware/authorise';
import type { LoadSheet } from '../../../shared/schemas/load-sheet';
import { MoveLoad } from './move-load.entity';
import { planOfMove, recordOf } from './move-planning';
import { moves } from './moves.service';

/** A destination site (with its grower and drop count) or yard, as read for the sheet. */
interface DestinationRow {
  id: string;
  name: string;
  latitude: number | null;
  longitude: number | null;
  access_notes: string;
  crop?: string | null;
  grower_id?: string | null;
  grower_name?: string | null;
  /** A count; PostgreSQL's integer from jsonb_array_length. */
  drops?: number | string;
}

interface ContractRow {
  id: string;
  crop: string;
  status: string;
  colonies_ordered: number;
  min_frames: number;
  average_frames: number | null;
  delivery_start_on: string;
  delivery_end_on: string;
}

/**
 * The printable load sheet: one page per truck with its pick-ups in order (yard names and access
 * notes, which the crew need for gates), pallets, weights, drivers, the destination with the
 * grower's contacts and drop reference, and the cautions. Staff only (growers never get yard
 * access notes); there is no money on it, so crew get all of it.
 */
export async function loadSheetOf(
  db: DataSource,
  actor: Actor,
  moveId: string,
): Promise<LoadSheet> {
  const move = await moves.get(db, actor.operationId, moveId);
  const plan = await planOfMove(db, actor.operationId, move);
  const yardIds = [...new Set(plan.loadSheet.origins.map((o) => o.yardId))];

  const [loads, yards, destinations, contract] = await Promise.all([
    db.getRepository(MoveLoad).find({
      where: { operationId: actor.operationId, moveId: move.id },
      order: { position: 'ASC', id: 'ASC' },
    }),
    db.query(
      `SELECT id, name, latitude, longitude, access_notes FROM yards WHERE operation_id = $1 AND id = ANY($2::uuid[])`,
      [actor.operationId, yardIds],
    ) as Promise<
      Array<{ id: string; name: string; latitude: number; longitude: number; access_notes: string }>
    >,
    move.destinationKind === 'site'
      ? (db.query(
          `SELECT s.id, s.name, s.latitude, s.longitude, s.access_notes, s.crop, s.grower_id,
                  COALESCE(jsonb_array_length(s.drops -> 'features'), 0) AS drops, g.name AS grower_name
             FROM sites s LEFT JOIN growers g ON g.id = s.grower_id
            WHERE s.operation_id = $1 AND s.id = ANY($2::uuid[])`,
          [actor.operationId, move.destinationIds],
        ) as Promise<DestinationRow[]>)
      : (db.query(
          `SELECT id, name, latitude, longitude, access_notes FROM yards WHERE operation_id = $1 AND id = ANY($2::uuid[])`,
          [actor.operationId, move.destinationIds],
        ) as Promise<DestinationRow[]>),
    move.contractId
      ? (db.query(
          `SELECT id, crop, status, colonies_ordered, min_frames, average_frames,
                  to_char(delivery_start_on, 'YYYY-MM-DD') AS delivery_start_on,
                  to_char(delivery_end_on, 'YYYY-MM-DD') AS delivery_end_on
             FROM contracts WHERE operation_id = $1 AND id = $2`,
          [actor.operationId, move.contractId],
        ) as Promise<ContractRow[]>)
      : Promise.resolve([] as ContractRow[]),
  ]);
  const growerIds = [...new Set(destinations.map((d) => d.grower_id).filter(Boolean))];
  const contacts = (await db.query(
    `SELECT grower_id, name, phone, title FROM grower_contacts
      WHERE operation_id = $1 AND grower_id = ANY($2::uuid[]) ORDER BY position, name`,
    [actor.operationId, growerIds],
  )) as Array<{ grower_id: string; name: string; phone: string | null; title: string }>;

  const yardById = new Map(yards.map((y) => [y.id, y]));
  const duskByYard = new Map(plan.timeline.originDusk.map((d) => [d.yardId, d]));
  const orderOf = new Map(move.destinationIds.map((id, i) => [id, i]));
  const [c] = contract;

  return {
    move: {
      id: move.id,
      name: move.name,
      nightOf: move.nightOf,
      status: move.status,
      drivers: move.drivers,
      loadingMinutes: move.loadingMinutes,
      averageSpeedKmh: move.averageSpeedKmh,
      notes: move.notes,
      version: move.version,
    },
    planSource: plan.planSource,
    computedAt: plan.computedAt,
    contract: c
      ? {
          id: c.id,
          crop: c.crop,
          status: c.status,
          coloniesOrdered: c.colonies_ordered,
          minFrames: c.min_frames,
          averageFrames: c.average_frames,
          deliveryStartOn: c.delivery_start_on,
          deliveryEndOn: c.delivery_end_on,
        }
      : null,
    destinations: destinations
      .sort((a, b) => (orderOf.get(a.id) ?? 0) - (orderOf.get(b.id) ?? 0))
      .map((d) => ({
        kind: move.destinationKind,
        id: d.id,
        name: d.name,
        latitude: d.latitude,
        longitude: d.longitude,
        accessNotes: d.access_notes,
        crop: d.crop ?? null,
        dropMap: move.destinationKind === 'site' ? { siteId: d.id, drops: Number(d.drops) } : null,
        grower: d.grower_id
          ? {
              id: d.grower_id,
              name: d.grower_name ?? '',
              contacts: contacts
                .filter((x) => x.grower_id === d.grower_id)
                .map((x) => ({ name: x.name, phone: x.phone, title: x.title })),
            }
          : null,
      })),
    timeline: plan.timeline,
    totals: plan.loadSheet.totals,
    palletTareKg: plan.loadSheet.palletTareKg,
    pages: plan.loadSheet.trucks.map((truck, i) => {
      const load = loads[i];
      return {
        page: i + 1,
        loadId: load?.id ?? null,
        ...truck,
        stops: truck.stops.map((stop) => {
          const yard = yardById.get(stop.yardId);
          const dusk = duskByYard.get(stop.yardId);
          return {
            ...stop,
            latitude: yard?.latitude ?? null,
            longitude: yard?.longitude ?? null,
            accessNotes: yard?.access_notes ?? '',
            timeZone: dusk?.timeZone ?? null,
            civilDusk: dusk?.civilDusk ?? null,
          };
        }),
        recorded: load ? recordOf(load) : null,
      };
    }),
    warnings: plan.warnings,
    cautions: plan.cautions,
    assumptions: plan.assumptions,
  };
}
