import { z } from 'zod';
import {
  acceptInviteSchema,
  brewerySettingsSchema,
  changePasswordSchema,
  idParam,
  inviteSchema,
  resetPasswordSchema,
  resetRequestSchema,
  signInSchema,
  signUpSchema,
  tokenParam,
  updateMemberSchema,
  type Me,
} from '../schemas/auth';
import type { Role } from '../schemas/roles';
import { route } from './route';

const tokenParams = z.strictObject({ token: tokenParam });
const userParams = z.strictObject({ userId: idParam });

/** Who an invite is for, shown before the person accepts it. */
export interface InviteDescription {
  email: string;
  breweryName: string;
  role: string;
}

export interface Team {
  members: { id: number; email: string; displayName: string; role: Role; disabled: boolean }[];
  pendingInvites: { id: number; email: string; role: Role; expiresAt: string }[];
}

export const authRoutes = {
  signIn: route<Me>()({ method: 'post', path: '/api/auth/sign-in', body: signInSchema }),
  signUp: route<Me>()({ method: 'post', path: '/api/auth/sign-up', body: signUpSchema }),
  signOut: route()({ method: 'post', path: '/api/auth/sign-out' }),
  me: route<Me>()({ method: 'get', path: '/api/auth/me' }),
  changePassword: route()({ method: 'post', path: '/api/auth/password', body: changePasswordSchema }),
  requestReset: route<{ message: string }>()({
    method: 'post',
    path: '/api/auth/reset-request',
    body: resetRequestSchema,
  }),
  checkReset: route()({ method: 'get', path: '/api/auth/reset/:token', params: tokenParams }),
  resetPassword: route()({
    method: 'post',
    path: '/api/auth/reset/:token',
    params: tokenParams,
    body: resetPasswordSchema,
  }),
  describeInvite: route<InviteDescription>()({ method: 'get', path: '/api/auth/invites/:token', params: tokenParams }),
  acceptInvite: route<Me>()({
    method: 'post',
    path: '/api/auth/invites/:token',
    params: tokenParams,
    body: acceptInviteSchema,
  }),
};

export const teamRoutes = {
  list: route<Team>()({ method: 'get', path: '/api/team' }),
  invite: route<{ id: number; email: string }>()({ method: 'post', path: '/api/team/invites', body: inviteSchema }),
  updateMember: route<{ id: number; role: Role; disabled: boolean }>()({
    method: 'patch',
    path: '/api/team/:userId',
    params: userParams,
    body: updateMemberSchema,
  }),
};

export const breweryRoutes = {
  get: route<Me['brewery']>()({ method: 'get', path: '/api/brewery' }),
  update: route<Me['brewery']>()({ method: 'patch', path: '/api/brewery', body: brewerySettingsSchema }),
};
