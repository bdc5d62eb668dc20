import type { DataSource } from 'typeorm';
import { preparedRead } from '../../db/data-source';
import type { SessionUser } from '../../../shared/schemas/users';

interface UserRow {
  id: string;
  email: string;
  name: string;
  role: SessionUser['role'];
  operation_id: string;
  operation_name: string;
  grower_id: string | null;
  units: SessionUser['units'];
  password_hash: string;
  active: boolean;
}

const toSessionUser = (row: UserRow): SessionUser => ({
  id: row.id,
  email: row.email,
  name: row.name,
  role: row.role,
  operationId: row.operation_id,
  operationName: row.operation_name,
  growerId: row.grower_id,
  units: row.units,
});

const select = `SELECT u.id, u.email, u.name, u.role, u.operation_id, o.name AS operation_name,
                       u.grower_id, u.units, u.password_hash, u.active
                  FROM users u JOIN operations o ON o.id = u.operation_id`;

/** Looks up users for sign-in and for each request's session. */
export class SessionUsers {
  constructor(private readonly db: DataSource) {}

  /** The user with this e-mail and their hash, or null. */
  async findForSignIn(
    email: string,
  ): Promise<{ user: SessionUser; passwordHash: string; active: boolean } | null> {
    const rows: UserRow[] = await this.db.query(`${select} WHERE lower(u.email) = lower($1)`, [
      email,
    ]);
    return rows[0]
      ? {
          user: toSessionUser(rows[0]),
          passwordHash: rows[0].password_hash,
          active: rows[0].active,
        }
      : null;
  }

  /** The active user with this id, or null (a deactivated user's session no longer signs them in). */
  async findActive(id: string): Promise<SessionUser | null> {
    const rows: UserRow[] = await this.db.query(`${select} WHERE u.id = $1 AND u.active`, [id]);
    return rows[0] ? toSessionUser(rows[0]) : null;
  }

  /**
   * A live session and its signed-in user in one query (the user null when none is signed in, or
   * they are deactivated or gone). Null when the session does not exist or has expired.
   */
  async loadSession(
    sid: string,
  ): Promise<{ sess: Record<string, unknown>; user: SessionUser | null } | null> {
    // Runs on every request: prepared, so it is planned once per connection.
    const rows = await preparedRead<Partial<UserRow> & { sess: Record<string, unknown> | string }>(
      this.db,
      'session-with-user',
      `SELECT s.sess, u.id, u.email, u.name, u.role, u.operation_id, o.name AS operation_name,
                u.grower_id, u.units
           FROM sessions s
           LEFT JOIN users u
             ON u.active
            AND u.id = CASE WHEN s.sess #>> '{passport,user}' ~* '^[0-9a-f-]{36}$'
                            THEN (s.sess #>> '{passport,user}')::uuid END
           LEFT JOIN operations o ON o.id = u.operation_id
          WHERE s.sid = $1 AND s.expire >= now()`,
      [sid],
    );
    const row = rows[0];
    if (!row) return null;
    const sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
    return { sess, user: row.id ? toSessionUser(row as UserRow) : null };
  }

  /** Ends every session of a user, except optionally one. */
  async endSessions(userId: string, exceptSid?: string): Promise<void> {
    await this.db.query(
      `DELETE FROM sessions WHERE sess -> 'passport' ->> 'user' = $1 AND ($2::text IS NULL OR sid <> $2)`,
      [userId, exceptSid ?? null],
    );
  }
}
