import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { actorOf, allow, staff } from '../../middleware/authorise';
import {
  strengthSampleCreateRequest,
  strengthSampleListQuery,
  weightSampleCreateRequest,
  weightSampleListQuery,
} from '../../../shared/schemas/samples';
import { SamplesService } from './samples.service';

/** /api/weight-samples and /api/strength-samples: staff read and record (crew weigh and inspect). */
export function samplesRouters(db: DataSource): Array<[string, Router]> {
  const service = new SamplesService(db);
  const weights = Router();
  weights.get('/', allow(...staff), async (req, res) => {
    res.json(
      await service.listWeights(actorOf(req), parseOrThrow(weightSampleListQuery, req.query)),
    );
  });
  weights.post('/', allow(...staff), async (req, res) => {
    res
      .status(201)
      .json(
        await service.recordWeights(
          actorOf(req),
          parseOrThrow(weightSampleCreateRequest, req.body),
        ),
      );
  });
  const strength = Router();
  strength.get('/', allow(...staff), async (req, res) => {
    res.json(
      await service.listStrength(actorOf(req), parseOrThrow(strengthSampleListQuery, req.query)),
    );
  });
  strength.post('/', allow(...staff), async (req, res) => {
    res
      .status(201)
      .json(
        await service.recordStrength(
          actorOf(req),
          parseOrThrow(strengthSampleCreateRequest, req.body),
        ),
      );
  });
  return [
    ['/weight-samples', weights],
    ['/strength-samples', strength],
  ];
}
