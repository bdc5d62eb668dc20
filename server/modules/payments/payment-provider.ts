import Stripe from 'stripe';
import type { Env } from '../../config/env';
import { AppError } from '../../errors/app-error';

export type PaymentsConfig = Pick<
  Env,
  | 'PAYMENTS_SECRET_KEY'
  | 'PAYMENTS_WEBHOOK_SECRET'
  | 'PAYMENTS_API_HOST'
  | 'PAYMENTS_API_PORT'
  | 'PAYMENTS_API_PROTOCOL'
  | 'PAYMENTS_CURRENCY'
>;

/**
 * The hosted-payments SDK client, or null when no secret key is configured. With
 * PAYMENTS_API_HOST set the SDK talks to that host instead of the provider (the local fake in
 * `npm start` and `npm test`); otherwise to the real API with the real key.
 */
export function createPaymentsClient(config: PaymentsConfig): Stripe | null {
  if (!config.PAYMENTS_SECRET_KEY) return null;
  return new Stripe(config.PAYMENTS_SECRET_KEY, {
    maxNetworkRetries: 1,
    timeout: 15_000,
    telemetry: false,
    appInfo: { name: 'Duskhaul' },
    ...(config.PAYMENTS_API_HOST
      ? {
          host: config.PAYMENTS_API_HOST,
          port: config.PAYMENTS_API_PORT,
          protocol: config.PAYMENTS_API_PROTOCOL,
        }
      : {}),
  });
}

/** The 503 a payment route answers when no provider is configured. */
export const paymentsUnavailable = () =>
  new AppError(
    503,
    'service_unavailable',
    'Online payment is not set up for this installation.',
    {},
    { 'Retry-After': '3600' },
  );
