import type { DataSource } from 'typeorm';
import { AppError } from '../../errors/app-error';

/** Failures in a row, for one e-mail and address, after which sign-in is refused for a while. */
export const maxFailuresInARow = 5;
/** How long the refusal lasts after the last failure. */
export const lockoutSeconds = 15 * 60;

const keyOf = (email: string, address: string) => `${email.toLowerCase()}|${address}`;

/**
 * Counts failed sign-ins per e-mail and address in PostgreSQL, so every app server shares them.
 * The sixth attempt after five failures in a row gets 429 with Retry-After.
 */
export class SignInThrottle {
  constructor(private readonly db: DataSource) {}

  /** Throws 429 when this e-mail and address are locked out. */
  async check(email: string, address: string): Promise<void> {
    const rows: Array<{ failures: number; seconds_left: number }> = await this.db.query(
      `SELECT failures, $2::int - extract(epoch FROM now() - last_failure_at)::int AS seconds_left
         FROM sign_in_failures WHERE key = $1`,
      [keyOf(email, address), lockoutSeconds],
    );
    const row = rows[0];
    if (row && row.failures >= maxFailuresInARow && row.seconds_left > 0) {
      throw new AppError(
        429,
        'too_many_requests',
        'Too many failed sign-ins. Wait a few minutes and try again.',
        { retryAfterSeconds: row.seconds_left },
        { 'Retry-After': String(row.seconds_left) },
      );
    }
  }

  async recordFailure(email: string, address: string): Promise<void> {
    await this.db.query(
      `INSERT INTO sign_in_failures (key, failures, last_failure_at) VALUES ($1, 1, now())
       ON CONFLICT (key) DO UPDATE SET
         failures = CASE WHEN sign_in_failures.last_failure_at < now() - make_interval(secs => $2)
                         THEN 1 ELSE sign_in_failures.failures + 1 END,
         last_failure_at = now()`,
      [keyOf(email, address), lockoutSeconds],
    );
  }

  async recordSuccess(email: string, address: string): Promise<void> {
    await this.db.query(`DELETE FROM sign_in_failures WHERE key = $1`, [keyOf(email, address)]);
  }
}
