import { z } from 'zod';
import { equipmentSchema, idParam } from '../../shared/schemas/recipes';
import { defineRouter, actor } from './define';
import * as equipment from '../services/equipment';
import { recordAudit } from '../services/audit';

const params = z.strictObject({ equipmentId: idParam });

export const equipmentRouter = defineRouter('/api/equipment', [
  {
    method: 'get',
    path: '/',
    access: 'equipment.read',
    handler: async (req, res) => {
      res.json(await equipment.listEquipment(actor(req).breweryId));
    },
  },
  {
    method: 'post',
    path: '/',
    access: 'equipment.edit',
    body: equipmentSchema,
    handler: async (req, res) => {
      res.status(201).json(await equipment.createEquipment(actor(req).breweryId, req.body));
    },
  },
  {
    method: 'put',
    path: '/:equipmentId',
    access: 'equipment.edit',
    params,
    body: equipmentSchema,
    handler: async (req, res) => {
      res.json(await equipment.updateEquipment(actor(req).breweryId, Number(req.params.equipmentId), req.body));
    },
  },
  {
    method: 'delete',
    path: '/:equipmentId',
    access: 'equipment.edit',
    params,
    handler: async (req, res) => {
      await equipment.deleteEquipment(actor(req).breweryId, Number(req.params.equipmentId));
      await recordAudit(req, 'equipment.remove', { equipmentId: Number(req.params.equipmentId) });
      res.status(204).end();
    },
  },
]);
