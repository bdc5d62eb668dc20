import { Router } from 'express';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners, staff } from '../../middleware/authorise';
import { archiveRequest } from '../../../shared/schemas/common';
import {
  sprayNoticeAcknowledgeRequest,
  sprayNoticeCreateRequest,
  sprayNoticeListQuery,
} from '../../../shared/schemas/spray-notices';
import { SprayNoticesService, type SprayNoticeDeps } from './spray-notices.service';

/**
 * /api/spray-notices: growers file and see their own; staff see all of the operation; owners
 * and planners acknowledge. Every answer carries the label-and-local-rules caution.
 */
export function sprayNoticesRouter(deps: SprayNoticeDeps) {
  const service = new SprayNoticesService(deps);
  const router = Router();
  const readers = allow(...staff, 'grower');
  router.get('/', readers, async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(sprayNoticeListQuery, req.query)));
  });
  router.get('/:id', readers, async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.post('/', allow(...planners, 'grower'), async (req, res) => {
    const input = parseOrThrow(sprayNoticeCreateRequest, req.body);
    res.status(201).json(await service.create(actorOf(req), input));
  });
  router.post('/:id/acknowledge', allow(...planners), async (req, res) => {
    const input = parseOrThrow(sprayNoticeAcknowledgeRequest, req.body);
    res.json(await service.acknowledge(actorOf(req), idParam(req), input));
  });
  router.post('/:id/archive', allow(...planners, 'grower'), async (req, res) => {
    const { version } = parseOrThrow(archiveRequest, req.body);
    res.json(await service.archive(actorOf(req), idParam(req), version));
  });
  return router;
}
