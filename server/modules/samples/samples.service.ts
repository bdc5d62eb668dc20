import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { summariseWeightSamples } from '../../../shared/domain/hive-weight';
import { summariseStrength } from '../../../shared/domain/strength';
import type {
  StrengthSampleCreateRequest,
  WeightSampleCreateRequest,
  strengthSampleListQuery,
  weightSampleListQuery,
} from '../../../shared/schemas/samples';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import { colonyLots } from '../colony-lots/colony-lots.router';
import { LedgerRepository } from '../ledger/ledger.repository';
import { moves } from '../moves/moves.service';
import { StrengthSample } from './strength-sample.entity';
import { WeightSample } from './weight-sample.entity';

const places = new LedgerRepository();

/** Filters with only the values given (TypeORM refuses `undefined` in a where). */
function definedOnly<T extends Record<string, unknown>>(filters: T): T {
  return Object.fromEntries(Object.entries(filters).filter(([, v]) => v !== undefined)) as T;
}

/** The default strength minimum for summaries: the common 6-frame almond minimum (REFERENCES.md). */
const defaultMinimumFrames = 6;

function presentWeights(s: WeightSample) {
  return {
    id: s.id,
    yardId: s.yardId,
    lotId: s.lotId,
    moveId: s.moveId,
    sampledOn: s.sampledOn,
    weightsKg: s.weightsKg,
    // A spread needs two readings; a single one is kept but not summarised.
    summary: s.weightsKg.length >= 2 ? summariseWeightSamples(s.weightsKg) : null,
    notes: s.notes,
    createdAt: s.createdAt.toISOString(),
  };
}

function presentStrength(s: StrengthSample, minimumFrames: number) {
  return {
    id: s.id,
    placeKind: s.placeKind,
    placeId: s.placeId,
    lotId: s.lotId,
    sampledOn: s.sampledOn,
    frames: s.frames,
    minimumFrames,
    summary: s.frames.length >= 2 ? summariseStrength(s.frames, minimumFrames) : null,
    notes: s.notes,
    createdAt: s.createdAt.toISOString(),
  };
}

/** Scale readings and strength inspections: appended readings, summarised by the domain code. */
export class SamplesService {
  constructor(private readonly db: DataSource) {}

  private async checkPlace(
    tx: EntityManager,
    actor: Actor,
    kind: 'yard' | 'site',
    placeId: string,
    field: string,
  ) {
    if (!(await places.placeExists(tx, actor.operationId, { kind, id: placeId }))) {
      throw AppError.validation([{ field, message: `No such ${kind}.` }]);
    }
  }

  private async checkLot(tx: EntityManager, actor: Actor, lotId: string | null | undefined) {
    if (!lotId) return;
    await colonyLots.get(tx, actor.operationId, lotId).catch(() => {
      throw AppError.validation([{ field: 'lotId', message: 'No such colony lot.' }]);
    });
  }

  async listWeights(actor: Actor, query: z.infer<typeof weightSampleListQuery>) {
    const [items, total] = await this.db.getRepository(WeightSample).findAndCount({
      where: definedOnly({
        operationId: actor.operationId,
        yardId: query.yardId,
        lotId: query.lotId,
        moveId: query.moveId,
      }),
      order: { sampledOn: 'DESC', createdAt: 'DESC' },
      take: query.limit,
      skip: query.offset,
    });
    return { items: items.map(presentWeights), total };
  }

  async recordWeights(actor: Actor, input: WeightSampleCreateRequest) {
    return this.db.transaction(async (tx) => {
      if (input.yardId) await this.checkPlace(tx, actor, 'yard', input.yardId, 'yardId');
      await this.checkLot(tx, actor, input.lotId);
      if (input.moveId) {
        await moves.get(tx, actor.operationId, input.moveId).catch(() => {
          throw AppError.validation([{ field: 'moveId', message: 'No such move.' }]);
        });
      }
      const repo = tx.getRepository(WeightSample);
      const saved = await repo.save(
        repo.create({
          operationId: actor.operationId,
          yardId: input.yardId ?? null,
          lotId: input.lotId ?? null,
          moveId: input.moveId ?? null,
          sampledOn: input.sampledOn,
          weightsKg: input.weightsKg,
          notes: input.notes ?? '',
          recordedBy: actor.id,
        }),
      );
      return presentWeights(saved);
    });
  }

  async listStrength(actor: Actor, query: z.infer<typeof strengthSampleListQuery>) {
    const [items, total] = await this.db.getRepository(StrengthSample).findAndCount({
      where: definedOnly({
        operationId: actor.operationId,
        placeKind: query.placeKind,
        placeId: query.placeId,
        lotId: query.lotId,
      }),
      order: { sampledOn: 'DESC', createdAt: 'DESC' },
      take: query.limit,
      skip: query.offset,
    });
    return {
      items: items.map((s) => presentStrength(s, query.minimumFrames ?? defaultMinimumFrames)),
      total,
    };
  }

  async recordStrength(actor: Actor, input: StrengthSampleCreateRequest) {
    return this.db.transaction(async (tx) => {
      await this.checkPlace(tx, actor, input.placeKind, input.placeId, 'placeId');
      await this.checkLot(tx, actor, input.lotId);
      const repo = tx.getRepository(StrengthSample);
      const saved = await repo.save(
        repo.create({
          operationId: actor.operationId,
          placeKind: input.placeKind,
          placeId: input.placeId,
          lotId: input.lotId ?? null,
          sampledOn: input.sampledOn,
          frames: input.frames,
          notes: input.notes ?? '',
          recordedBy: actor.id,
        }),
      );
      return presentStrength(saved, defaultMinimumFrames);
    });
  }
}
