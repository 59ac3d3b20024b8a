import { equipmentRoutes } from '../../shared/contract/recipes';
import { BREWING_ROLES } from '../../shared/schemas/roles';
import { defineRouter } from './define';
import * as equipment from '../services/equipment';
import { recordAudit } from '../services/audit';

export const equipmentRouter = defineRouter('/api/equipment', equipmentRoutes, {
  list: {
    access: BREWING_ROLES,
    handler: async ({ user, res }) => {
      res.json(await equipment.listEquipment(user.breweryId));
    },
  },
  create: {
    access: ['head_brewer'],
    handler: async ({ user, body, res }) => {
      res.status(201).json(await equipment.createEquipment(user.breweryId, body));
    },
  },
  update: {
    access: ['head_brewer'],
    handler: async ({ user, params, body, res }) => {
      res.json(await equipment.updateEquipment(user.breweryId, params.equipmentId, body));
    },
  },
  remove: {
    access: ['head_brewer'],
    handler: async ({ user, params, req, res }) => {
      await equipment.deleteEquipment(user.breweryId, params.equipmentId);
      await recordAudit(req, 'equipment.remove', { equipmentId: params.equipmentId });
      res.status(204).end();
    },
  },
});
