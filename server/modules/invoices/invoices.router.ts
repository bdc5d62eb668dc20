import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { parseOrThrow } from '../../errors/validate';
import { idParam } from '../../http/params';
import { actorOf, allow } from '../../middleware/authorise';
import {
  checkoutRequest,
  invoiceCreateRequest,
  invoiceIssueRequest,
  invoiceListQuery,
  invoiceVoidRequest,
  receivablesQuery,
} from '../../../shared/schemas/invoices';
import type { JobQueue } from '../jobs/job-queue';
import { startCheckout } from '../payments/checkout';
import { closeOpenCheckouts } from '../payments/close-checkouts';
import { createPaymentsClient } from '../payments/payment-provider';
import { csvDownload, invoicesCsv } from './exports';
import { InvoicesService } from './invoices.service';
import { receivables } from './receivables';

export interface InvoiceRouterDeps {
  db: DataSource;
  env: Env;
  jobs?: JobQueue;
}

/**
 * /api/invoices: the owner bills and voids; planners read; growers read and pay their own;
 * crew never see invoices (403).
 */
export function invoicesRouter({ db, env, jobs }: InvoiceRouterDeps) {
  const service = new InvoicesService({ db, env, jobs });
  const provider = createPaymentsClient(env);
  const read = allow('owner', 'planner', 'grower');
  const bill = allow('owner');
  const router = Router();
  // Before /:id, so the file name is not read as an id.
  router.get('/export.csv', bill, async (req, res) => {
    csvDownload(res, 'invoices.csv', await invoicesCsv(db, actorOf(req).operationId));
  });
  router.get('/', read, async (req, res) => {
    res.json(await service.list(actorOf(req), parseOrThrow(invoiceListQuery, req.query)));
  });
  router.get('/:id', read, async (req, res) => {
    res.json(await service.get(actorOf(req), idParam(req)));
  });
  router.post('/', bill, async (req, res) => {
    res
      .status(201)
      .json(await service.create(actorOf(req), parseOrThrow(invoiceCreateRequest, req.body)));
  });
  router.post('/:id/issue', bill, async (req, res) => {
    const id = idParam(req);
    res.json(await service.issue(actorOf(req), id, parseOrThrow(invoiceIssueRequest, req.body)));
  });
  router.post('/:id/void', bill, async (req, res) => {
    const actor = actorOf(req);
    const id = idParam(req);
    const voided = await service.void(
      actor,
      id,
      parseOrThrow(invoiceVoidRequest, req.body).version,
    );
    // A void invoice should not be payable through a page the grower still has open.
    await closeOpenCheckouts(db, provider, actor.operationId, id);
    res.json(voided);
  });
  router.post('/:id/checkout', allow('owner', 'grower'), async (req, res) => {
    const actor = actorOf(req);
    const id = idParam(req);
    parseOrThrow(checkoutRequest, req.body ?? {});
    res.status(201).json(await startCheckout({ db, env, provider, invoices: service }, actor, id));
  });
  return router;
}

/** /api/receivables: what growers owe, by grower and age; the season's revenue by crop (owner). */
export function receivablesRouter(db: DataSource) {
  const router = Router();
  router.get('/', allow('owner'), async (req, res) => {
    res.json(await receivables(db, actorOf(req), parseOrThrow(receivablesQuery, req.query)));
  });
  return router;
}
