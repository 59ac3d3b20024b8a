import type { RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/roles';
import { forbidden, unauthenticated } from '../errors';
import { recordAudit } from '../services/audit';

/** Who may call a route: anyone, any signed-in person, or the listed roles. */
export type Access = 'public' | 'signed-in' | readonly Role[];

/** The one authorisation decision for every route. */
export function authorise(access: Access): RequestHandler {
  return async (req, _res, next) => {
    if (access === 'public') return next();
    if (!req.user) return next(unauthenticated());
    if (access === 'signed-in' || access.includes(req.user.role)) return next();
    await recordAudit(req, 'request.denied', { method: req.method, path: req.originalUrl.split('?')[0] });
    next(forbidden());
  };
}
