import { recipeRoutes } from '../../shared/contract/recipes';
import { defineRouter } from './define';
import * as recipes from '../services/recipes';
import { scaleVersion } from '../services/recipe-plans';
import { notFound } from '../errors';

export const recipesRouter = defineRouter('/api/recipes', recipeRoutes, {
  list: {
    access: 'recipe.read',
    handler: async ({ user, res }) => {
      res.json(await recipes.listRecipes(user.breweryId));
    },
  },
  create: {
    access: 'recipe.edit',
    handler: async ({ user, body, res }) => {
      res.status(201).json(await recipes.createRecipe(user, body));
    },
  },
  get: {
    access: 'recipe.read',
    handler: async ({ user, params, res }) => {
      res.json(await recipes.getRecipe(user.breweryId, params.recipeId));
    },
  },
  update: {
    access: 'recipe.edit',
    handler: async ({ user, params, body, res }) => {
      res.json(await recipes.updateRecipe(user.breweryId, params.recipeId, body));
    },
  },
  addVersion: {
    access: 'recipe.edit',
    handler: async ({ user, params, body, res }) => {
      res.status(201).json(await recipes.addVersion(user, params.recipeId, body));
    },
  },
  compare: {
    access: 'recipe.read',
    handler: async ({ user, params, query, res }) => {
      res.json(await recipes.compareVersions(user.breweryId, params.recipeId, query.a, query.b));
    },
  },
  getVersion: {
    access: 'recipe.read',
    handler: async ({ user, params, res }) => {
      res.json(await recipes.getVersion(user.breweryId, params.recipeId, params.versionId));
    },
  },
  updateVersion: {
    access: 'recipe.edit',
    handler: async ({ user, params, body, res }) => {
      res.json(await recipes.updateVersion(user, params.recipeId, params.versionId, body));
    },
  },
  scale: {
    access: 'recipe.read',
    handler: async ({ user, params, query, res }) => {
      const s = await scaleVersion(user.breweryId, params.versionId, query);
      if (s.recipe.id !== params.recipeId) throw notFound('This recipe version');
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
  saveScaled: {
    access: 'recipe.edit',
    handler: async ({ user, params, body, res }) => {
      res.status(201).json(await recipes.saveScaledVersion(user, params.recipeId, params.versionId, body));
    },
  },
});
