import type { RequestHandler } from 'express';
import { can, type Action } from '../../shared/policy';
import { forbidden, unauthenticated } from '../errors';
import { recordAudit } from '../services/audit';

/** The one authorisation decision for every route: may the signed-in person (or anyone) do the action? */
export function authorise(action: Action): RequestHandler {
  return async (req, _res, next) => {
    if (can(req.user?.role, action)) return next();
    if (!req.user) return next(unauthenticated());
    await recordAudit(req, 'request.denied', { method: req.method, path: req.originalUrl.split('?')[0] });
    next(forbidden());
  };
}
