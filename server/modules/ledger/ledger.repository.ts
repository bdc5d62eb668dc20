import type { DataSource, EntityManager } from 'typeorm';
import type { ColonyCount, PlaceKind } from '../../../shared/schemas/ledger';
import { preparedRead } from '../../db/data-source';

type Db = DataSource | EntityManager;

/** Sums ledger entries into counts; the ledger is the only source of colony counts. */
export class LedgerRepository {
  /**
   * Colonies per place and lot on a date (entries dated that day included): each running
   * balance less the flows dated after `on` (see the colony_balances migration).
   */
  async countsOn(
    db: Db,
    operationId: string,
    on: string,
    place?: { kind?: PlaceKind; id?: string },
  ): Promise<ColonyCount[]> {
    const rows = await preparedRead<Record<string, string | number>>(
      db,
      'ledger-counts-on',
      `WITH sums AS (
         SELECT place_kind, place_id, lot_id, SUM(colonies)::int AS colonies
           FROM (SELECT place_kind, place_id, lot_id, colonies FROM colony_balances
                  WHERE operation_id = $1
                 UNION ALL
                 SELECT place_kind, place_id, lot_id, -delta FROM ledger_flows
                  WHERE operation_id = $1 AND occurred_on > $2) x
          WHERE ($3::text IS NULL OR place_kind = $3)
            AND ($4::uuid IS NULL OR place_id = $4)
          GROUP BY place_kind, place_id, lot_id
         HAVING SUM(colonies) <> 0)
       SELECT c.place_kind, c.place_id, COALESCE(y.name, s.name) AS place_name, c.lot_id,
              l.name AS lot_name, l.hive_setup_id, h.name AS hive_setup_name, c.colonies
         FROM sums c
         JOIN colony_lots l ON l.id = c.lot_id
         JOIN hive_setups h ON h.id = l.hive_setup_id
         LEFT JOIN yards y ON c.place_kind = 'yard' AND y.id = c.place_id
         LEFT JOIN sites s ON c.place_kind = 'site' AND s.id = c.place_id
        ORDER BY place_name, l.name`,
      [operationId, on, place?.kind ?? null, place?.id ?? null],
    );
    return rows.map((r) => ({
      placeKind: r.place_kind as PlaceKind,
      placeId: String(r.place_id),
      placeName: String(r.place_name),
      lotId: String(r.lot_id),
      lotName: String(r.lot_name),
      hiveSetupId: String(r.hive_setup_id),
      hiveSetupName: String(r.hive_setup_name),
      colonies: Number(r.colonies),
    }));
  }

  /**
   * The fewest colonies of a lot at a place on `from` or any later date that has entries: what
   * can leave on `from` without making a later count negative.
   */
  async lowestBalanceFrom(
    db: Db,
    operationId: string,
    lotId: string,
    place: { kind: PlaceKind; id: string },
    from: string,
  ): Promise<number> {
    const [row]: Array<{ lowest: number | null }> = await db.query(
      `WITH moves AS (
         SELECT occurred_on,
                CASE WHEN to_kind = $3 AND to_id = $4 THEN colonies ELSE 0 END
              - CASE WHEN from_kind = $3 AND from_id = $4 THEN colonies ELSE 0 END AS delta
           FROM ledger_entries WHERE operation_id = $1 AND lot_id = $2),
       dates AS (SELECT $5::date AS d UNION SELECT occurred_on FROM moves WHERE occurred_on > $5)
       SELECT MIN((SELECT COALESCE(SUM(delta), 0) FROM moves WHERE occurred_on <= dates.d))::int AS lowest FROM dates`,
      [operationId, lotId, place.kind, place.id, from],
    );
    return row?.lowest ?? 0;
  }

  /** Serialises ledger writes for one lot of one operation until the transaction ends. */
  async lockLot(db: EntityManager, operationId: string, lotId: string): Promise<void> {
    await db.query(`SELECT pg_advisory_xact_lock(hashtextextended($1 || ':' || $2, 0))`, [
      operationId,
      lotId,
    ]);
  }

  /** True when the place exists in the operation. */
  async placeExists(
    db: Db,
    operationId: string,
    place: { kind: PlaceKind; id: string },
  ): Promise<boolean> {
    const table = place.kind === 'yard' ? 'yards' : 'sites';
    const rows = await db.query(`SELECT 1 FROM ${table} WHERE operation_id = $1 AND id = $2`, [
      operationId,
      place.id,
    ]);
    return rows.length === 1;
  }
}
