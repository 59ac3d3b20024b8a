import { z } from 'zod';
import { idParam, inviteSchema, updateMemberSchema, brewerySettingsSchema } from '../../shared/schemas/auth';
import { defineRouter, actor } from './define';
import * as auth from '../services/auth';
import { recordAudit, withAudit } from '../services/audit';

const userParams = z.strictObject({ userId: idParam });

export const teamRouter = defineRouter('/api/team', [
  {
    method: 'get',
    path: '/',
    access: 'team.manage',
    handler: async (req, res) => {
      res.json(await auth.teamMembers(actor(req).breweryId));
    },
  },
  {
    method: 'post',
    path: '/invites',
    access: 'team.manage',
    body: inviteSchema,
    handler: async (req, res) => {
      const invite = await auth.inviteTeammate(actor(req), req.body);
      await recordAudit(req, 'invite.send', { email: req.body.email, role: req.body.role });
      res.status(201).json(invite);
    },
  },
  {
    method: 'patch',
    path: '/:userId',
    access: 'team.manage',
    params: userParams,
    body: updateMemberSchema,
    handler: async (req, res) => {
      const user = await auth.updateMember(actor(req), Number(req.params.userId), req.body);
      await recordAudit(req, req.body.role ? 'role.change' : 'access.change', { userId: user.id, ...req.body });
      res.json({ id: user.id, role: user.role, disabled: Boolean(user.disabledAt) });
    },
  },
]);

export const breweryRouter = defineRouter('/api/brewery', [
  {
    method: 'get',
    path: '/',
    access: 'brewery.read',
    handler: async (req, res) => {
      res.json(actor(req).brewery);
    },
  },
  {
    method: 'patch',
    path: '/',
    access: 'brewery.edit',
    body: brewerySettingsSchema,
    handler: async (req, res) => {
      const brewery = await withAudit(req, 'brewery.settings', req.body, (t) =>
        auth.updateBrewery(actor(req).breweryId, req.body, t),
      );
      res.json({ id: brewery.id, name: brewery.name, unitSystem: brewery.unitSystem, timeZone: brewery.timeZone });
    },
  },
]);
