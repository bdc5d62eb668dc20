import type { Request, RequestHandler } from 'express';
import type { Role, SessionUser } from '../../shared/schemas/users';
import { AppError } from '../errors/app-error';

/** Who is acting: the signed-in user (the tenant and grower scope every query uses). */
export type Actor = SessionUser;

/** The signed-in user, or a 401. */
export function actorOf(req: Request): Actor {
  if (!req.user) throw AppError.unauthenticated();
  return req.user as Actor;
}

/** Lets through signed-in users of the given roles: 401 when signed out, 403 for other roles. */
export function allow(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const actor = actorOf(req);
    if (!roles.includes(actor.role)) throw AppError.forbidden();
    next();
  };
}

/** Staff of the operation (everyone but growers). */
export const staff: Role[] = ['owner', 'planner', 'crew'];
/** Those who edit the season's records. */
export const planners: Role[] = ['owner', 'planner'];
