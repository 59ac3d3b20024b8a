import { rateLimit } from 'express-rate-limit';

/**
 * Five failed password checks per client in 15 minutes; the sixth answers 429.
 * Shared by sign-in, reset requests and signatures that re-enter a password.
 * Kept in memory per app server: behind a load balancer, use a shared store (see README).
 */
export const signInLimiter = rateLimit({
  windowMs: 15 * 60 * 1000,
  limit: 5,
  skipSuccessfulRequests: true,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, res) => {
    res.status(429).json({
      error: { code: 'too_many_attempts', message: 'Too many failed attempts. Wait 15 minutes and try again.' },
    });
  },
});
