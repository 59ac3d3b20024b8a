import passport from 'passport';
import type { Request, Response, NextFunction } from 'express';
import { authRoutes } from '../../shared/contract/auth';
import { defineRouter } from './define';
import * as auth from '../services/auth';
import { recordAudit } from '../services/audit';
import { unauthenticated, wrongPassword } from '../errors';
import { signInLimiter } from '../middlewares/rate-limit';

/** Passport hands errors over untyped; a rejection always carries an Error. */
const asError = (err: unknown) => (err instanceof Error ? err : new Error(String(err)));

/** Starts a fresh session for the person (passport regenerates the session id). */
function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => {
    req.login(user, (err) => {
      if (err) return reject(asError(err));
      req.session.signedInAt = req.session.lastSeenAt = Date.now();
      resolve();
    });
  });
}

function authenticateLocal(req: Request, res: Response): Promise<Express.User | false> {
  return new Promise((resolve, reject) => {
    // passport types what authenticate() returns as any; it is Express middleware.
    const handler = passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return reject(asError(err));
      resolve(user);
    }) as (req: Request, res: Response, next: NextFunction) => void;
    handler(req, res, (e?: unknown) => e && reject(asError(e)));
  });
}

export const authRouter = defineRouter('/api/auth', authRoutes, {
  signIn: {
    access: 'account.signIn',
    before: [signInLimiter],
    handler: async ({ body, req, res }) => {
      const user = await authenticateLocal(req, res);
      if (!user) {
        await recordAudit(req, 'sign-in.failure', { email: body.email }, { userId: null, breweryId: null });
        throw wrongPassword(401, 'E-mail or password is not right');
      }
      await logIn(req, user);
      await recordAudit(req, 'sign-in.success', null, { userId: user.id, breweryId: user.breweryId });
      res.json(auth.me(user));
    },
  },
  signUp: {
    access: 'account.signUp',
    handler: async ({ body, req, res }) => {
      const user = await auth.signUp(body);
      const signedIn = await auth.sessionUser(user.id);
      if (!signedIn) throw unauthenticated();
      await logIn(req, signedIn);
      await recordAudit(req, 'sign-up', null, { userId: user.id, breweryId: user.breweryId });
      res.status(201).json(auth.me(signedIn));
    },
  },
  signOut: {
    access: 'account.signOut',
    handler: async ({ req, res }) => {
      if (req.user) await recordAudit(req, 'sign-out');
      await new Promise<void>((resolve) => req.logout(() => resolve()));
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      res.status(204).end();
    },
  },
  me: {
    access: 'account.read',
    handler: async ({ user, res }) => {
      res.json(auth.me(user));
    },
  },
  changePassword: {
    access: 'account.changePassword',
    // A stolen session must not be a way to guess the password without limit.
    before: [signInLimiter],
    handler: async ({ user, body, req, res }) => {
      await auth.changePassword(user.id, body, req.sessionID);
      await recordAudit(req, 'password.change');
      res.status(204).end();
    },
  },
  requestReset: {
    access: 'account.resetPassword',
    before: [signInLimiter],
    handler: async ({ body, req, res }) => {
      const user = await auth.requestPasswordReset(body.email, req.log);
      await recordAudit(
        req,
        'password.reset-request',
        { email: body.email },
        {
          userId: user?.id ?? null,
          breweryId: user?.breweryId ?? null,
        },
      );
      res.status(202).json({ message: 'If this e-mail has an account, a reset link is on its way.' });
    },
  },
  checkReset: {
    access: 'account.resetPassword',
    handler: async ({ params, res }) => {
      await auth.checkResetLink(params.token);
      res.status(204).end();
    },
  },
  resetPassword: {
    access: 'account.resetPassword',
    handler: async ({ params, body, req, res }) => {
      const user = await auth.resetPassword(params.token, body.password);
      await recordAudit(req, 'password.reset', null, { userId: user.id, breweryId: user.breweryId });
      res.status(204).end();
    },
  },
  describeInvite: {
    access: 'account.acceptInvite',
    handler: async ({ params, res }) => {
      res.json(await auth.describeInvite(params.token));
    },
  },
  acceptInvite: {
    access: 'account.acceptInvite',
    handler: async ({ params, body, req, res }) => {
      const user = await auth.acceptInvite(params.token, body);
      const signedIn = await auth.sessionUser(user.id);
      if (!signedIn) throw unauthenticated();
      await logIn(req, signedIn);
      await recordAudit(req, 'invite.accept', null, { userId: user.id, breweryId: user.breweryId });
      res.status(201).json(auth.me(signedIn));
    },
  },
});
