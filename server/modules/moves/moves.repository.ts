import type { EntityManager } from 'typeorm';

/** Statuses whose origins are promises of colonies not yet moved in the ledger. */
export const promisingStatuses = ['planned', 'loading', 'rolling'] as const;

/** Queries about the colonies that open moves have promised. */
export class MovesRepository {
  /** Serialises promise checks within one operation until the transaction ends. */
  async lockPromises(tx: EntityManager, operationId: string) {
    await tx.query(`SELECT pg_advisory_xact_lock(hashtextextended('promises:' || $1, 0))`, [
      operationId,
    ]);
  }

  /** Colonies of a lot at a yard that other open moves already take. */
  async promisedElsewhere(
    tx: EntityManager,
    operationId: string,
    yardId: string,
    lotId: string,
    exceptMoveId: string | null,
  ): Promise<number> {
    const [row]: Array<{ promised: number }> = await tx.query(
      `SELECT COALESCE(SUM(o.colonies), 0)::int AS promised
         FROM move_origins o JOIN moves m ON m.id = o.move_id
        WHERE o.operation_id = $1 AND o.yard_id = $2 AND o.lot_id = $3
          AND m.status = ANY($4) AND m.archived_at IS NULL AND ($5::uuid IS NULL OR m.id <> $5)`,
      [operationId, yardId, lotId, [...promisingStatuses], exceptMoveId],
    );
    return row.promised;
  }
}
