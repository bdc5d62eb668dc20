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
  // Folder of the built client; served when present.
  CLIENT_DIST: z.string().default('dist'),
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
