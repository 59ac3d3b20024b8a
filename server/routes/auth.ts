import passport from 'passport';
import type { Request, Response, NextFunction } from 'express';
import { z } from 'zod';
import {
  acceptInviteSchema,
  changePasswordSchema,
  resetPasswordSchema,
  resetRequestSchema,
  signInSchema,
  signUpSchema,
  tokenParam,
} from '../../shared/schemas/auth';
import { defineRouter, actor } from './define';
import * as auth from '../services/auth';
import { recordAudit } from '../services/audit';
import { unauthenticated, wrongPassword } from '../errors';
import { signInLimiter } from '../middlewares/rate-limit';

const tokenParams = z.strictObject({ token: tokenParam });

/** Starts a fresh session for the person (passport regenerates the session id). */
function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => {
    req.login(user, (err) => {
      if (err) return reject(err);
      req.session.signedInAt = req.session.lastSeenAt = Date.now();
      resolve();
    });
  });
}

function authenticateLocal(req: Request, res: Response): Promise<Express.User | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return reject(err);
      resolve(user);
    })(req, res, ((e: unknown) => e && reject(e)) as NextFunction);
  });
}

export const authRouter = defineRouter('/api/auth', [
  {
    method: 'post',
    path: '/sign-in',
    access: 'account.signIn',
    before: [signInLimiter],
    body: signInSchema,
    handler: async (req, res) => {
      const user = await authenticateLocal(req, res);
      if (!user) {
        await recordAudit(req, 'sign-in.failure', { email: req.body.email }, { userId: null, breweryId: null });
        throw wrongPassword(401, 'E-mail or password is not right');
      }
      await logIn(req, user);
      await recordAudit(req, 'sign-in.success', null, { userId: user.id, breweryId: user.breweryId });
      res.json(auth.me(user));
    },
  },
  {
    method: 'post',
    path: '/sign-up',
    access: 'account.signUp',
    body: signUpSchema,
    handler: async (req, res) => {
      const user = await auth.signUp(req.body);
      const signedIn = await auth.sessionUser(user.id);
      if (!signedIn) throw unauthenticated();
      await logIn(req, signedIn);
      await recordAudit(req, 'sign-up', null, { userId: user.id, breweryId: user.breweryId });
      res.status(201).json(auth.me(signedIn));
    },
  },
  {
    method: 'post',
    path: '/sign-out',
    access: 'account.signOut',
    handler: async (req, res) => {
      if (req.user) await recordAudit(req, 'sign-out');
      await new Promise<void>((resolve) => req.logout(() => resolve()));
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      res.status(204).end();
    },
  },
  {
    method: 'get',
    path: '/me',
    access: 'account.read',
    handler: async (req, res) => {
      res.json(auth.me(actor(req)));
    },
  },
  {
    method: 'post',
    path: '/password',
    access: 'account.changePassword',
    body: changePasswordSchema,
    // A stolen session must not be a way to guess the password without limit.
    before: [signInLimiter],
    handler: async (req, res) => {
      await auth.changePassword(actor(req).id, req.body, req.sessionID);
      await recordAudit(req, 'password.change');
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/reset-request',
    access: 'account.resetPassword',
    before: [signInLimiter],
    body: resetRequestSchema,
    handler: async (req, res) => {
      const user = await auth.requestPasswordReset(req.body.email, req.log);
      await recordAudit(
        req,
        'password.reset-request',
        { email: req.body.email },
        {
          userId: user?.id ?? null,
          breweryId: user?.breweryId ?? null,
        },
      );
      res.status(202).json({ message: 'If this e-mail has an account, a reset link is on its way.' });
    },
  },
  {
    method: 'get',
    path: '/reset/:token',
    access: 'account.resetPassword',
    params: tokenParams,
    handler: async (req, res) => {
      await auth.checkResetLink(req.params.token as string);
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/reset/:token',
    access: 'account.resetPassword',
    params: tokenParams,
    body: resetPasswordSchema,
    handler: async (req, res) => {
      const user = await auth.resetPassword(req.params.token as string, req.body.password);
      await recordAudit(req, 'password.reset', null, { userId: user.id, breweryId: user.breweryId });
      res.status(204).end();
    },
  },
  {
    method: 'get',
    path: '/invites/:token',
    access: 'account.acceptInvite',
    params: tokenParams,
    handler: async (req, res) => {
      res.json(await auth.describeInvite(req.params.token as string));
    },
  },
  {
    method: 'post',
    path: '/invites/:token',
    access: 'account.acceptInvite',
    params: tokenParams,
    body: acceptInviteSchema,
    handler: async (req, res) => {
      const user = await auth.acceptInvite(req.params.token as string, req.body);
      const signedIn = await auth.sessionUser(user.id);
      if (!signedIn) throw unauthenticated();
      await logIn(req, signedIn);
      await recordAudit(req, 'invite.accept', null, { userId: user.id, breweryId: user.breweryId });
      res.status(201).json(auth.me(signedIn));
    },
  },
]);
