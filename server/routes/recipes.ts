import { z } from 'zod';
import {
  compareQuerySchema,
  createRecipeSchema,
  idParam,
  saveScaledSchema,
  saveVersionSchema,
  scaleQuerySchema,
  updateRecipeSchema,
} from '../../shared/schemas/recipes';
import { defineRouter, actor } from './define';
import * as recipes from '../services/recipes';
import { scaleVersion } from '../services/recipe-plans';
import { notFound } from '../errors';

const recipeParams = z.strictObject({ recipeId: idParam });
const versionParams = z.strictObject({ recipeId: idParam, versionId: idParam });
const ids = (req: { params: Record<string, unknown> }) => ({
  recipeId: Number(req.params.recipeId),
  versionId: Number(req.params.versionId),
});

export const recipesRouter = defineRouter('/api/recipes', [
  {
    method: 'get',
    path: '/',
    access: 'recipe.read',
    handler: async (req, res) => {
      res.json(await recipes.listRecipes(actor(req).breweryId));
    },
  },
  {
    method: 'post',
    path: '/',
    access: 'recipe.edit',
    body: createRecipeSchema,
    handler: async (req, res) => {
      res.status(201).json(await recipes.createRecipe(actor(req), req.body));
    },
  },
  {
    method: 'get',
    path: '/:recipeId',
    access: 'recipe.read',
    params: recipeParams,
    handler: async (req, res) => {
      res.json(await recipes.getRecipe(actor(req).breweryId, ids(req).recipeId));
    },
  },
  {
    method: 'patch',
    path: '/:recipeId',
    access: 'recipe.edit',
    params: recipeParams,
    body: updateRecipeSchema,
    handler: async (req, res) => {
      res.json(await recipes.updateRecipe(actor(req).breweryId, ids(req).recipeId, req.body));
    },
  },
  {
    method: 'post',
    path: '/:recipeId/versions',
    access: 'recipe.edit',
    params: recipeParams,
    body: saveVersionSchema,
    handler: async (req, res) => {
      res.status(201).json(await recipes.addVersion(actor(req), ids(req).recipeId, req.body));
    },
  },
  {
    method: 'get',
    path: '/:recipeId/compare',
    access: 'recipe.read',
    params: recipeParams,
    query: compareQuerySchema,
    handler: async (req, res) => {
      const { a, b } = req.query as unknown as z.infer<typeof compareQuerySchema>;
      res.json(await recipes.compareVersions(actor(req).breweryId, ids(req).recipeId, a, b));
    },
  },
  {
    method: 'get',
    path: '/:recipeId/versions/:versionId',
    access: 'recipe.read',
    params: versionParams,
    handler: async (req, res) => {
      const { recipeId, versionId } = ids(req);
      res.json(await recipes.getVersion(actor(req).breweryId, recipeId, versionId));
    },
  },
  {
    method: 'patch',
    path: '/:recipeId/versions/:versionId',
    access: 'recipe.edit',
    params: versionParams,
    body: saveVersionSchema,
    handler: async (req, res) => {
      const { recipeId, versionId } = ids(req);
      res.json(await recipes.updateVersion(actor(req), recipeId, versionId, req.body));
    },
  },
  {
    method: 'get',
    path: '/:recipeId/versions/:versionId/scale',
    access: 'recipe.read',
    params: versionParams,
    query: scaleQuerySchema,
    handler: async (req, res) => {
      const { recipeId, versionId } = ids(req);
      const s = await scaleVersion(actor(req).breweryId, versionId, req.query as z.infer<typeof scaleQuerySchema>);
      if (s.recipe.id !== recipeId) throw notFound('This recipe version');
      res.json({
        recipe: { id: s.recipe.id, name: s.recipe.name, style: s.recipe.style },
        version: {
          id: s.version.id,
          number: s.version.number,
          frozen: Boolean(s.version.frozenAt),
          content: s.version.content,
        },
        source: { equipmentProfileId: s.sourceEquipmentId, equipment: s.source },
        target: { equipmentProfileId: s.targetEquipmentId, equipment: s.target },
        scaled: s.scaled,
      });
    },
  },
  {
    method: 'post',
    path: '/:recipeId/versions/:versionId/scaled',
    access: 'recipe.edit',
    params: versionParams,
    body: saveScaledSchema,
    handler: async (req, res) => {
      const { recipeId, versionId } = ids(req);
      res.status(201).json(await recipes.saveScaledVersion(actor(req), recipeId, versionId, req.body));
    },
  },
]);
