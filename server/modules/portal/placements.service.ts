import type { DataSource } from 'typeorm';
import { summariseStrength } from '../../../shared/domain/strength';
import type { Actor } from '../../middleware/authorise';
import type { BlockPlacement } from '../../../shared/schemas/portal';
import { LedgerRepository } from '../ledger/ledger.repository';
import { today } from '../ledger/ledger.service';

const ledger = new LedgerRepository();

/**
 * Colonies on each of the grower's blocks today (from the ledger) and the strength checks
 * recorded there, with the minimum of the contract covering that block. No lot names, yards,
 * notes or anything of the operation's own.
 */
export async function placementsForGrower(db: DataSource, actor: Actor): Promise<BlockPlacement[]> {
  const sites: Array<{ id: string; name: string }> = await db.query(
    `SELECT id, name FROM sites WHERE operation_id = $1 AND grower_id = $2 AND archived_at IS NULL ORDER BY name`,
    [actor.operationId, actor.growerId],
  );
  if (sites.length === 0) return [];
  const ids = sites.map((s) => s.id);
  const counts = await ledger.countsOn(db, actor.operationId, today(), { kind: 'site' });
  const samples: Array<{
    place_id: string;
    sampled_on: string;
    frames: number[];
    min_frames: number | null;
  }> = await db.query(
    `SELECT s.place_id, to_char(s.sampled_on, 'YYYY-MM-DD') AS sampled_on, s.frames,
            (SELECT c.min_frames FROM contracts c
              WHERE c.operation_id = s.operation_id AND s.place_id = ANY(c.site_ids) AND c.archived_at IS NULL
                AND c.status NOT IN ('withdrawn', 'turned-down')
              ORDER BY abs(c.delivery_start_on - s.sampled_on) LIMIT 1) AS min_frames
       FROM strength_samples s
      WHERE s.operation_id = $1 AND s.place_kind = 'site' AND s.place_id = ANY($2)
      ORDER BY s.sampled_on DESC, s.created_at DESC`,
    [actor.operationId, ids],
  );
  return sites.map((site) => ({
    siteId: site.id,
    siteName: site.name,
    coloniesToday: counts
      .filter((c) => c.placeId === site.id)
      .reduce((sum, c) => sum + c.colonies, 0),
    strengthChecks: samples
      .filter((s) => s.place_id === site.id)
      .map((s) => {
        const minimum = s.min_frames === null ? null : Number(s.min_frames);
        const summary = s.frames.length >= 2 ? summariseStrength(s.frames, minimum ?? 0) : null;
        return {
          sampledOn: s.sampled_on,
          coloniesInspected: s.frames.length,
          meanFrames: summary?.meanFrames ?? (s.frames.length === 1 ? s.frames[0] : null),
          minimumFrames: minimum,
          atOrAboveMinimum: minimum === null ? null : s.frames.filter((f) => f >= minimum).length,
        };
      }),
  }));
}
