import { breweryRoutes, teamRoutes } from '../../shared/contract/auth';
import { defineRouter } from './define';
import * as auth from '../services/auth';
import { recordAudit, withAudit } from '../services/audit';

export const teamRouter = defineRouter('/api/team', teamRoutes, {
  list: {
    access: 'team.manage',
    handler: async ({ user, res }) => {
      res.json(await auth.teamMembers(user.breweryId));
    },
  },
  invite: {
    access: 'team.manage',
    handler: async ({ user, body, req, res }) => {
      const invite = await auth.inviteTeammate(user, body);
      await recordAudit(req, 'invite.send', { email: body.email, role: body.role });
      res.status(201).json(invite);
    },
  },
  updateMember: {
    access: 'team.manage',
    handler: async ({ user, params, body, req, res }) => {
      const member = await withAudit(
        req,
        body.role ? 'role.change' : 'access.change',
        { userId: params.userId, ...body },
        (t) => auth.updateMember(user, params.userId, body, t),
      );
      res.json({ id: member.id, role: member.role, disabled: Boolean(member.disabledAt) });
    },
  },
});

export const breweryRouter = defineRouter('/api/brewery', breweryRoutes, {
  get: {
    access: 'brewery.read',
    handler: async ({ user, res }) => {
      res.json(user.brewery);
    },
  },
  update: {
    access: 'brewery.edit',
    handler: async ({ user, body, req, res }) => {
      const brewery = await withAudit(req, 'brewery.settings', body, (t) =>
        auth.updateBrewery(user.breweryId, body, t),
      );
      res.json({ id: brewery.id, name: brewery.name, unitSystem: brewery.unitSystem, timeZone: brewery.timeZone });
    },
  },
});
