import { createHash } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { fieldIssues } from '../../errors/validate';
import { toAppError } from '../../errors/error-handler';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import {
  moveSyncChange,
  moveSyncPayloads,
  type MoveStatus,
  type MoveSyncChange,
  type SyncOutcome,
} from '../../../shared/schemas/moves';
import { MoveLoad } from './move-load.entity';
import { presentLoad } from './move-planning';
import { moveRecords } from './move-records';
import { moves, type MovesService } from './moves.service';

/** What became of one queued change; nothing is dropped without an answer. */
export interface SyncResult {
  index: number;
  idempotencyKey: string | null;
  kind: string | null;
  moveId: string | null;
  loadId: string | null;
  outcome: SyncOutcome;
  /** The HTTP status this change would have had on its own. */
  status: number;
  /** The record after the change (applied) or as it was stored the first time (duplicate). */
  record?: unknown;
  /** The record as it is now, when the change conflicts with it. */
  current?: unknown;
  error?: { code: string; message: string; details: unknown };
}

/** Idempotency keys of crew sync live beside other operations' keys under their own prefix. */
const keyPrefix = 'move-sync:';

/** A stable JSON text (keys sorted) so the same change always hashes the same. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

function requestHash(change: MoveSyncChange): string {
  const { idempotencyKey: _key, ...rest } = change;
  return createHash('sha256').update(canonical(rest)).digest('hex');
}

const envelopeOf = (raw: unknown) => {
  const r = (raw && typeof raw === 'object' ? raw : {}) as Record<string, unknown>;
  const str = (v: unknown) => (typeof v === 'string' ? v.slice(0, 100) : null);
  return {
    idempotencyKey: str(r.idempotencyKey),
    kind: str(r.kind),
    moveId: str(r.moveId),
    loadId: str(r.loadId),
  };
};

/**
 * Offline sync: applies a batch of changes queued on a device, each in its own transaction and at
 * most once per idempotency key. The key's row is written in the same transaction as the change,
 * so a change is either applied and remembered, or neither. Only applied changes are remembered:
 * a conflict or a refusal is answered afresh on a retry, with the record as it is then.
 */
export class MoveSync {
  constructor(
    private readonly db: DataSource,
    private readonly service: MovesService,
    private readonly log: (error: unknown) => void = console.error,
  ) {}

  async sync(actor: Actor, changes: unknown[]): Promise<{ results: SyncResult[] }> {
    const results: SyncResult[] = [];
    for (const [index, raw] of changes.entries()) results.push(await this.one(actor, index, raw));
    return { results };
  }

  private async one(actor: Actor, index: number, raw: unknown): Promise<SyncResult> {
    const base = { index, ...envelopeOf(raw) };
    const refuse = (error: AppError): SyncResult => ({
      ...base,
      outcome: 'rejected',
      status: error.status,
      error: { code: error.code, message: error.message, details: error.details },
    });
    const parsed = moveSyncChange.safeParse(raw);
    if (!parsed.success) return refuse(AppError.validation(fieldIssues(parsed.error)));
    const change = parsed.data;
    const payload = moveSyncPayloads[change.kind].safeParse(change.payload);
    if (!payload.success) {
      const issues = fieldIssues(payload.error).map((i) => ({ ...i, field: `payload.${i.field}` }));
      return refuse(AppError.validation(issues));
    }
    if (change.kind === 'load-counts' && !change.loadId)
      return refuse(AppError.validation([{ field: 'loadId', message: 'Name the load.' }]));
    if ((change.kind === 'load-counts' || change.kind === 'status') && !change.version)
      return refuse(
        AppError.validation([{ field: 'version', message: 'Send the version you read.' }]),
      );
    const hash = requestHash({ ...change, payload: payload.data });
    const key = keyPrefix + change.idempotencyKey;

    try {
      return await this.db.transaction(async (tx) => {
        await tx.query(`SELECT pg_advisory_xact_lock(hashtextextended($1 || ':' || $2, 0))`, [
          actor.operationId,
          key,
        ]);
        const [seen] = (await tx.query(
          `SELECT request_hash, status_code, response FROM idempotency_keys WHERE operation_id = $1 AND key = $2`,
          [actor.operationId, key],
        )) as Array<{ request_hash: string; status_code: number; response: { record: unknown } }>;
        if (seen) {
          if (seen.request_hash !== hash) {
            return refuse(
              new AppError(
                422,
                'conflict',
                'This idempotency key was already used for a different change. Make a new key for a new change.',
              ),
            );
          }
          return {
            ...base,
            outcome: 'duplicate',
            status: seen.status_code,
            record: seen.response.record,
          };
        }
        const record = await this.apply(tx, actor, change, payload.data);
        await tx.query(
          `INSERT INTO idempotency_keys (operation_id, key, request_hash, status_code, response) VALUES ($1, $2, $3, 200, $4)`,
          [actor.operationId, key, hash, JSON.stringify({ record })],
        );
        return { ...base, outcome: 'applied', status: 200, record };
      });
    } catch (error) {
      const appError = toAppError(error);
      if (appError.status === 503) throw error; // the whole batch is retried later
      const answer = {
        code: appError.code,
        message: appError.message,
        details: appError.details,
      };
      if (appError.status === 409) {
        return {
          ...base,
          outcome: 'conflict',
          status: 409,
          current: await this.current(actor, change).catch(() => null),
          error: answer,
        };
      }
      if (appError.status >= 500) {
        this.log(error);
        return { ...base, outcome: 'failed', status: appError.status, error: answer };
      }
      return refuse(appError);
    }
  }

  private async apply(
    tx: EntityManager,
    actor: Actor,
    change: MoveSyncChange,
    payload: unknown,
  ): Promise<unknown> {
    switch (change.kind) {
      case 'load-counts':
        return moveRecords.recordLoadIn(
          tx,
          actor,
          change.moveId,
          change.loadId!,
          change.version!,
          payload as never,
        );
      case 'status':
        return this.service.changeStatusIn(
          tx,
          actor,
          change.moveId,
          change.version!,
          (payload as { status: MoveStatus }).status,
        );
      case 'weights':
        return moveRecords.addWeightsIn(tx, actor, change.moveId, payload as never);
      case 'note':
        return moveRecords.addNoteIn(
          tx,
          actor,
          change.moveId,
          change.loadId,
          change.version,
          (payload as { text: string }).text,
        );
    }
  }

  /** The record a conflicting change is about, as it is now. */
  private async current(actor: Actor, change: MoveSyncChange) {
    if (change.loadId) {
      const load = await this.db
        .getRepository(MoveLoad)
        .findOneBy({ id: change.loadId, moveId: change.moveId, operationId: actor.operationId });
      return load ? presentLoad(load) : null;
    }
    await moves.get(this.db, actor.operationId, change.moveId);
    return this.service.presentIn(this.db, actor, change.moveId);
  }
}
