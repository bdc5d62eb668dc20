import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import {
  ledgerCountsQuery,
  ledgerEntryCreateRequest,
  ledgerListQuery,
} from '../../../shared/schemas/ledger';
import { LedgerService } from './ledger.service';

/** /api/ledger: entries are appended, never edited or archived; corrections fix mistakes. */
export function ledgerRouter(db: DataSource) {
  const service = new LedgerService(db);
  const router = Router();

  router.get('/counts', allow(...staff), async (req, res) => {
    const query = parseOrThrow(ledgerCountsQuery, req.query);
    res.json({
      items: await service.counts(actorOf(req), query.on, {
        kind: query.placeKind,
        id: query.placeId,
      }),
    });
  });
  router.get('/', allow(...staff), async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(ledgerListQuery, req.query)));
  });
  router.get('/:id', allow(...staff), async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.post('/', allow(...planners), async (req, res) => {
    res
      .status(201)
      .json(await service.create(actorOf(req), parseOrThrow(ledgerEntryCreateRequest, req.body)));
  });
  return router;
}
