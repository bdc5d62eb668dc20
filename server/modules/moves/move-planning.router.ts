import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import { id } from '../../../shared/schemas/common';
import {
  loadRecordRequest,
  moveAvailabilityQuery,
  movePreviewRequest,
  moveSyncRequest,
} from '../../../shared/schemas/moves';
import { loadSheetOf } from './load-sheet';
import { availability, previewMove } from './move-planning';
import { moveRecords } from './move-records';
import { MoveSync } from './move-sync';
import { MovesService } from './moves.service';

const loadParams = z.object({ loadId: id });

/**
 * /api/moves planning and crew routes, mounted before the resource routes so `availability`
 * and `preview` are not read as move ids: the live preview, free colonies, the load sheet, the
 * crew's load records and the offline sync.
 */
export function movePlanningRouter(db: DataSource) {
  const router = Router();
  const service = new MovesService(db);
  const sync = new MoveSync(db, service);

  router.post('/preview', allow(...planners), async (req, res) => {
    const input = parseOrThrow(movePreviewRequest, req.body);
    res.json(await previewMove(db, actorOf(req), input));
  });

  router.get('/availability', allow(...staff), async (req, res) => {
    const { nightOf, exceptMoveId } = parseOrThrow(moveAvailabilityQuery, req.query);
    res.json(await availability(db, actorOf(req), nightOf, exceptMoveId ?? null));
  });

  router.post('/sync', allow(...staff), async (req, res) => {
    const { changes } = parseOrThrow(moveSyncRequest, req.body);
    res.json(await sync.sync(actorOf(req), changes));
  });

  router.get('/:id/load-sheet', allow(...staff), async (req, res) => {
    res.json(await loadSheetOf(db, actorOf(req), idParam(req)));
  });

  router.patch('/:id/loads/:loadId', allow(...staff), async (req, res) => {
    const moveId = idParam(req);
    const { loadId } = parseOrThrow(loadParams, { loadId: req.params.loadId });
    const { version, ...fields } = parseOrThrow(loadRecordRequest, req.body);
    const actor = actorOf(req);
    res.json(
      await db.transaction((tx) =>
        moveRecords.recordLoadIn(tx, actor, moveId, loadId, version, fields),
      ),
    );
  });

  return router;
}
