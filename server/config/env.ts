import { z } from 'zod';

/** Process configuration, validated once at start-up; a bad value stops the server at once. */
const envSchema = z.object({
  // production | development | test. Production requires HTTPS-only cookies and a real secret.
  NODE_ENV: z.enum(['production', 'development', 'test']).default('development'),
  // Port the app and API listen on (npm start's default is 3000; 0 picks a free port).
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  // Address to bind; loopback unless told otherwise.
  HOST: z.string().default('127.0.0.1'),
  // Any PostgreSQL; npm start and npm test set it to their private cluster.
  DATABASE_URL: z.string().url(),
  // Size of the PostgreSQL connection pool per app server.
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(10),
  // Milliseconds a single SQL statement may run before it is cancelled.
  DATABASE_STATEMENT_TIMEOUT_MS: z.coerce.number().int().min(100).default(10_000),
  // Signs session cookies. At least 32 characters.
  SESSION_SECRET: z.string().min(32),
  // Minutes without a request before a session ends.
  SESSION_IDLE_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .default(12 * 60),
  // Hours after sign-in at which a session ends however active it is.
  SESSION_ABSOLUTE_HOURS: z.coerce
    .number()
    .int()
    .min(1)
    .default(7 * 24),
  // Set to "true" when the app is served over HTTPS (directly or behind a proxy): Secure cookies
  // with the __Host- prefix.
  HTTPS: z.enum(['true', 'false']).default('false'),
  // Number of proxies in front of the app whose X-Forwarded-For to trust (0 = none).
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).default(0),
  // An OSRM-compatible routing service (e.g. http://127.0.0.1:5000) for road distances in move
  // timelines; without it, distance is the great circle × a road factor.
  ROUTING_URL: z.string().url().optional(),
  // An MBTiles archive of vector tiles (e.g. an OpenStreetMap extract built with planetiler or
  // tilemaker, see docs/atlas.md) served at /tiles/base instead of the built-in boundaries.
  MBTILES_PATH: z.string().min(1).optional(),
  // Folder of the built client; served when present.
  CLIENT_DIST: z.string().default('dist'),
  // SMTP server for outgoing e-mail (npm start and npm test point it at the local fake).
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  // Its port (587 with STARTTLS or 465 with SMTP_SECURE=true at most providers; 2525 the fake).
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  // "true" for implicit TLS from the first byte (port 465); otherwise STARTTLS when offered.
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  // SMTP sign-in name; leave unset for a server that needs none (the local fake).
  SMTP_USER: z.string().optional(),
  // SMTP password, used with SMTP_USER.
  SMTP_PASSWORD: z.string().optional(),
  // The From address of every e-mail the product sends.
  MAIL_FROM: z.string().min(3).default('Duskhaul <no-reply@duskhaul.localhost>'),
  // The address growers reach the app at: the base of every link in an e-mail.
  APP_URL: z.string().url().default('http://localhost:3000'),
  // Days an e-mailed proposal link stays valid.
  PROPOSAL_LINK_DAYS: z.coerce.number().int().min(1).max(60).default(14),
  // Folder for uploaded documents, outside the web root (created on first upload).
  DOCUMENTS_DIR: z.string().min(1).default('.data/documents'),
  // Largest accepted upload in bytes (10 MiB); one byte more gets 413.
  DOCUMENTS_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1024)
    .max(100 * 1024 * 1024)
    .default(10 * 1024 * 1024),
  // Hosted-payments (Stripe) secret key; unset turns online payment off (checkout answers 503).
  PAYMENTS_SECRET_KEY: z.string().min(8).optional(),
  // Signing secret of the payments webhook endpoint (whsec_…); webhooks are refused without it.
  PAYMENTS_WEBHOOK_SECRET: z.string().min(8).optional(),
  // API host override for the payments SDK: the local fake (npm start, npm test); unset in production.
  PAYMENTS_API_HOST: z.string().min(1).optional(),
  // Port of that API host.
  PAYMENTS_API_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  // Protocol of that API host: http for the local fake.
  PAYMENTS_API_PROTOCOL: z.enum(['http', 'https']).default('https'),
  // ISO currency of invoices paid online (lower case, as the provider expects).
  PAYMENTS_CURRENCY: z
    .string()
    .regex(/^[a-z]{3}$/)
    .default('usd'),
});

export type Env = z.infer<typeof envSchema>;

/** Reads and validates the environment; throws listing every bad variable. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n  ${problems.join('\n  ')}`);
  }
  return parsed.data;
}
