import { Router, type Request } from 'express';
import passport from 'passport';
import { z } from 'zod';
import type { DataSource } from 'typeorm';
import { AppError } from '../../errors/app-error';
import { parseOrThrow } from '../../errors/validate';
import { actorOf } from '../../middleware/authorise';
import {
  passwordChangeRequest,
  preferencesRequest,
  signInRequest,
  type SessionUser,
} from '../../../shared/schemas/users';
import type { SessionLayer, SignInFailure } from './session-middleware';
import { hashPassword, verifyPassword } from './passwords';

function authenticate(req: Request): Promise<{ user: SessionUser | false; info?: SignInFailure }> {
  return new Promise((resolve, reject) => {
    passport.authenticate(
      'local',
      (error: unknown, user: SessionUser | false, info?: SignInFailure) =>
        error ? reject(error) : resolve({ user, info }),
    )(req);
  });
}

const logIn = (req: Request, user: SessionUser) =>
  new Promise<void>((resolve, reject) =>
    req.login(user, (error) => (error ? reject(error) : resolve())),
  );
const logOut = (req: Request) =>
  new Promise<void>((resolve, reject) =>
    req.logout((error) => (error ? reject(error) : resolve())),
  );

/** GET/POST/DELETE /api/session: who is signed in, sign in, sign out; preferences and password. */
export function sessionRouter(db: DataSource, layer: SessionLayer) {
  const router = Router();

  router.get('/', (req, res) => {
    res.json({ user: req.user ?? null, csrfToken: layer.generateCsrfToken(req) });
  });

  router.post('/', async (req, res) => {
    req.body = parseOrThrow(signInRequest, req.body);
    const { user, info } = await authenticate(req);
    if (!user)
      throw new AppError(401, 'unauthenticated', info?.message ?? 'Wrong e-mail or password.');
    await logIn(req, user); // passport regenerates the session id here
    req.session.signedInAt = Date.now();
    res.json({ user, csrfToken: layer.generateCsrfToken(req, true) });
  });

  router.delete('/', async (req, res) => {
    if (req.user) await logOut(req);
    req.session?.destroy(() => undefined);
    res.status(204).end();
  });

  router.put('/preferences', async (req, res) => {
    const actor = actorOf(req);
    const { units } = parseOrThrow(preferencesRequest, req.body);
    await db.query(`UPDATE users SET units = $1, updated_at = now() WHERE id = $2`, [
      units,
      actor.id,
    ]);
    res.json({ user: { ...actor, units } });
  });

  router.post('/password', async (req, res) => {
    const actor = actorOf(req);
    const body = parseOrThrow(passwordChangeRequest, req.body);
    const [row]: Array<{ password_hash: string }> = await db.query(
      `SELECT password_hash FROM users WHERE id = $1`,
      [actor.id],
    );
    if (!row || !(await verifyPassword(row.password_hash, body.currentPassword))) {
      throw AppError.validation([
        { field: 'currentPassword', message: 'This is not your current password.' },
      ]);
    }
    await db.query(`UPDATE users SET password_hash = $1, updated_at = now() WHERE id = $2`, [
      await hashPassword(body.newPassword),
      actor.id,
    ]);
    // A new password ends the user's other sessions.
    await layer.users.endSessions(actor.id, req.sessionID);
    res.status(204).end();
  });

  return router;
}

export const sessionResponse = z.object({ user: z.unknown().nullable(), csrfToken: z.string() });
