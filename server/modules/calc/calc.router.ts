import { Router } from 'express';
import { computeHiveWeight } from '../../../shared/domain/hive-weight';
import { computeLoadPlan } from '../../../shared/domain/load-plan';
import { computeMoveWindow } from '../../../shared/domain/move-window';
import { computeSitePlan } from '../../../shared/domain/site-plan';
import {
  hiveWeightRequest,
  loadPlanRequest,
  moveWindowRequest,
  sitePlanRequest,
} from '../../../shared/schemas/calc';
import { AppError } from '../../errors/app-error';
import { parseOrThrow } from '../../errors/validate';
import { allow, staff } from '../../middleware/authorise';
import type { RoadDistance } from './routing-service';

/** Runs a pure computation; its own range errors (inputs zod cannot see) become a 400. */
function compute<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) {
      throw new AppError(400, 'validation_failed', error.message, [
        { field: '(body)', message: error.message },
      ]);
    }
    throw error;
  }
}

/** POST /api/calc/*: the season's arithmetic (DESIGN.md's stable calculation contract). */
export function calcRouter(roads: RoadDistance | null) {
  const router = Router();
  router.use(allow(...staff));

  router.post('/hive-weight', (req, res) => {
    const input = parseOrThrow(hiveWeightRequest, req.body);
    const { weightKg, parts } = compute(() => computeHiveWeight(input));
    res.json({ weightKg, parts });
  });

  router.post('/load-plan', (req, res) => {
    const input = parseOrThrow(loadPlanRequest, req.body);
    res.json(compute(() => computeLoadPlan(input)));
  });

  router.post('/move-window', async (req, res) => {
    const input = parseOrThrow(moveWindowRequest, req.body);
    const routed =
      input.distanceKm === undefined && roads
        ? await roads.distanceKm(input.origin, input.destination)
        : null;
    const window = compute(() =>
      computeMoveWindow({ ...input, distanceKm: input.distanceKm ?? routed ?? undefined }),
    );
    res.json({
      ...window,
      distanceSource:
        input.distanceKm !== undefined
          ? 'given'
          : routed !== null
            ? 'routing-service'
            : 'great-circle',
    });
  });

  router.post('/site-plan', (req, res) => {
    const input = parseOrThrow(sitePlanRequest, req.body);
    if (!input.boundary && input.areaHa === undefined) {
      throw AppError.validation([{ field: 'boundary', message: 'Give a boundary or areaHa.' }]);
    }
    res.json(compute(() => computeSitePlan(input)));
  });

  return router;
}
