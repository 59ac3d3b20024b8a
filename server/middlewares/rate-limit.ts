import type { Application, RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { errorBody } from '../../shared/schemas/errors';

/**
 * Five failed password checks per client in 15 minutes; the sixth answers 429.
 * Shared by sign-in, reset requests and signatures that re-enter a password.
 * Only an answer the error handler gave the code 'wrong_password' counts (sign-in's 401, a signature's 400):
 * a malformed body (400 too), another batch's 404 or a reset request never uses up a person's attempts.
 * Kept in memory per app server: behind a load balancer, use a shared store (see README).
 */
function createSignInLimiter(): RequestHandler {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 5,
    skipSuccessfulRequests: true,
    requestWasSuccessful: (_req, res) => res.locals.errorCode !== 'wrong_password',
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json(errorBody('too_many_attempts', 'Too many failed attempts. Wait 15 minutes and try again.'));
    },
  });
}

// The routers are built once per process, so the count is looked up per app rather than held by the router:
// every createApp() starts with its own memory, as a restarted server does.
const limiters = new WeakMap<Application, RequestHandler>();

/** Gives an app its own sign-in limiter; createApp() calls this. */
export function useSignInLimiter(app: Application): void {
  limiters.set(app, createSignInLimiter());
}

export const signInLimiter: RequestHandler = (req, res, next) => {
  const limiter = limiters.get(req.app);
  if (!limiter) return next(new Error('This app has no sign-in limiter: call useSignInLimiter(app) in createApp()'));
  return limiter(req, res, next);
};
