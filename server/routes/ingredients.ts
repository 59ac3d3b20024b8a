import { z } from 'zod';
import { idParam, ingredientQuerySchema, ingredientSchema } from '../../shared/schemas/recipes';
import { defineRouter, actor } from './define';
import * as ingredients from '../services/ingredients';
import { recordAudit } from '../services/audit';

const params = z.strictObject({ ingredientId: idParam });

export const ingredientsRouter = defineRouter('/api/ingredients', [
  {
    method: 'get',
    path: '/',
    access: 'ingredient.read',
    query: ingredientQuerySchema,
    handler: async (req, res) => {
      const { kind } = req.query as z.infer<typeof ingredientQuerySchema>;
      res.json(await ingredients.listIngredients(actor(req).breweryId, kind));
    },
  },
  {
    method: 'post',
    path: '/',
    access: 'ingredient.edit',
    body: ingredientSchema,
    handler: async (req, res) => {
      res.status(201).json(await ingredients.createIngredient(actor(req).breweryId, req.body));
    },
  },
  {
    method: 'put',
    path: '/:ingredientId',
    access: 'ingredient.edit',
    params,
    body: ingredientSchema,
    handler: async (req, res) => {
      res.json(await ingredients.updateIngredient(actor(req).breweryId, Number(req.params.ingredientId), req.body));
    },
  },
  {
    method: 'delete',
    path: '/:ingredientId',
    access: 'ingredient.edit',
    params,
    handler: async (req, res) => {
      await ingredients.deleteIngredient(actor(req).breweryId, Number(req.params.ingredientId));
      await recordAudit(req, 'ingredient.remove', { ingredientId: Number(req.params.ingredientId) });
      res.status(204).end();
    },
  },
]);
