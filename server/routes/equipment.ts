import { equipmentRoutes } from '../../shared/contract/recipes';
import { defineRouter } from './define';
import * as equipment from '../services/equipment';
import { withAudit } from '../services/audit';

export const equipmentRouter = defineRouter('/api/equipment', equipmentRoutes, {
  list: {
    access: 'equipment.read',
    handler: async ({ user, res }) => {
      res.json(await equipment.listEquipment(user.breweryId));
    },
  },
  create: {
    access: 'equipment.edit',
    handler: async ({ user, body, res }) => {
      res.status(201).json(await equipment.createEquipment(user.breweryId, body));
    },
  },
  update: {
    access: 'equipment.edit',
    handler: async ({ user, params, body, res }) => {
      res.json(await equipment.updateEquipment(user.breweryId, params.equipmentId, body));
    },
  },
  remove: {
    access: 'equipment.edit',
    handler: async ({ user, params, req, res }) => {
      await withAudit(req, 'equipment.remove', { equipmentId: params.equipmentId }, (t) =>
        equipment.deleteEquipment(user.breweryId, params.equipmentId, t),
      );
      res.status(204).end();
    },
  },
});
