import { ingredientRoutes } from '../../shared/contract/recipes';
import { defineRouter } from './define';
import * as ingredients from '../services/ingredients';
import { withAudit } from '../services/audit';

export const ingredientsRouter = defineRouter('/api/ingredients', ingredientRoutes, {
  list: {
    access: 'ingredient.read',
    handler: async ({ user, query, res }) => {
      res.json(await ingredients.listIngredients(user.breweryId, query.kind));
    },
  },
  create: {
    access: 'ingredient.edit',
    handler: async ({ user, body, res }) => {
      res.status(201).json(await ingredients.createIngredient(user.breweryId, body));
    },
  },
  update: {
    access: 'ingredient.edit',
    handler: async ({ user, params, body, res }) => {
      res.json(await ingredients.updateIngredient(user.breweryId, params.ingredientId, body));
    },
  },
  remove: {
    access: 'ingredient.edit',
    handler: async ({ user, params, req, res }) => {
      await withAudit(req, 'ingredient.remove', { ingredientId: params.ingredientId }, (t) =>
        ingredients.deleteIngredient(user.breweryId, params.ingredientId, t),
      );
      res.status(204).end();
    },
  },
});
