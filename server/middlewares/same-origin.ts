import type { RequestHandler } from 'express';
import { forbidden } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
/** The header our client sends on every write. A cross-site form or fetch cannot set it without CORS, which we never grant. */
export const CLIENT_HEADER = 'x-kettlewright';

/**
 * Cross-site request forgery guard for state-changing requests: the custom header must be present,
 * and when the browser says where the request came from, it must be this site.
 */
export const sameOrigin: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  if (req.get(CLIENT_HEADER) !== '1') return next(forbidden('This request did not come from Kettlewright'));
  const origin = req.get('origin');
  if (origin) {
    const host = req.get('host');
    let originHost: string | undefined;
    try {
      originHost = new URL(origin).host;
    } catch {
      originHost = undefined;
    }
    if (originHost !== host) return next(forbidden('This request came from another site'));
  }
  next();
};
