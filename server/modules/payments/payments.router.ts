import express, { Router } from 'express';
import Stripe from 'stripe';
import type { DataSource } from 'typeorm';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';
import { actorOf, allow } from '../../middleware/authorise';
import { csvDownload, paymentsCsv } from '../invoices/exports';
import { applyPaymentEvent } from './payment-events';
import { paymentsUnavailable } from './payment-provider';

/** /api/payments: the owner's export of money received. */
export function paymentsRouter(db: DataSource) {
  const router = Router();
  router.get('/export.csv', allow('owner'), async (req, res) => {
    csvDownload(res, 'payments.csv', await paymentsCsv(db, actorOf(req).operationId));
  });
  return router;
}

/**
 * POST /api/payments/webhook: the provider's signed events. Mounted before the JSON parser and
 * outside sessions and CSRF, because the signature covers the exact bytes sent; the signature
 * (HMAC-SHA256 with the endpoint secret, checked by the SDK) is the only credential.
 */
export function paymentsWebhookRouter({
  db,
  env,
}: {
  db: DataSource;
  env: Pick<Env, 'PAYMENTS_WEBHOOK_SECRET'>;
}) {
  const router = Router();
  router.post(
    '/webhook',
    express.raw({ type: 'application/json', limit: '512kb' }),
    async (req, res) => {
      const signature = req.header('stripe-signature');
      if (!signature) throw new AppError(400, 'bad_request', 'The event is not signed.');
      if (!env.PAYMENTS_WEBHOOK_SECRET) throw paymentsUnavailable();
      if (!Buffer.isBuffer(req.body))
        throw new AppError(400, 'bad_request', 'Send the event as application/json.');
      let event: Stripe.Event;
      try {
        event = Stripe.webhooks.constructEvent(req.body, signature, env.PAYMENTS_WEBHOOK_SECRET);
      } catch {
        throw new AppError(400, 'bad_request', 'The event signature does not verify.');
      }
      const outcome = await applyPaymentEvent(db, event);
      res.json({ received: true, outcome });
    },
  );
  return router;
}
