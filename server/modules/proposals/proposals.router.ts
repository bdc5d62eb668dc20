import { Router } from 'express';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow, planners } from '../../middleware/authorise';
import {
  proposalAnswerRequest,
  proposalCounterRequest,
  proposalCreateRequest,
  proposalListQuery,
} from '../../../shared/schemas/proposals';
import { ProposalsService, type ProposalDeps } from './proposals.service';

/** Mounted at /api/contracts beside the contracts router: POST /:id/proposals (planners). */
export function contractProposalsRouter(deps: ProposalDeps) {
  const service = new ProposalsService(deps);
  const router = Router();
  router.post('/:id/proposals', allow(...planners), async (req, res) => {
    const input = parseOrThrow(proposalCreateRequest, req.body);
    res.status(201).json(await service.propose(actorOf(req), idParam(req), input));
  });
  return router;
}

/**
 * /api/proposals: planners list them; a signed-in grower lists and answers their own in the
 * portal (the same answers the e-mailed links give).
 */
export function proposalsRouter(deps: ProposalDeps) {
  const service = new ProposalsService(deps);
  const router = Router();
  router.get('/', allow(...planners, 'grower'), async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(proposalListQuery, req.query)));
  });
  router.post('/:id/confirm', allow('grower'), async (req, res) => {
    const { note } = parseOrThrow(proposalAnswerRequest, req.body);
    res.json(
      await service.answerAsGrower(actorOf(req), idParam(req), {
        kind: 'confirm',
        note: note ?? '',
      }),
    );
  });
  router.post('/:id/decline', allow('grower'), async (req, res) => {
    const { note } = parseOrThrow(proposalAnswerRequest, req.body);
    res.json(
      await service.answerAsGrower(actorOf(req), idParam(req), {
        kind: 'decline',
        note: note ?? '',
      }),
    );
  });
  router.post('/:id/counter', allow('grower'), async (req, res) => {
    const input = parseOrThrow(proposalCounterRequest, req.body);
    res.json(
      await service.answerAsGrower(actorOf(req), idParam(req), {
        kind: 'counter',
        deliveryStartOn: input.deliveryStartOn,
        deliveryEndOn: input.deliveryEndOn,
        colonies: input.colonies ?? null,
        note: input.note ?? '',
      }),
    );
  });
  return router;
}
