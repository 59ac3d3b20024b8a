import { z } from 'zod';
import type { ComputedRecipe, EquipmentProfile, ScaledRecipe } from '../brewing';
import {
  compareQuerySchema,
  createRecipeSchema,
  equipmentSchema,
  idParam,
  ingredientQuerySchema,
  ingredientSchema,
  saveScaledSchema,
  saveVersionSchema,
  scaleQuerySchema,
  updateRecipeSchema,
  type Difference,
  type IngredientKind,
  type RecipeListRow,
  type RecipeStatus,
  type RecipeVersionContent,
  type VersionSummary,
} from '../schemas/recipes';
import { route } from './route';

const recipeParams = z.strictObject({ recipeId: idParam });
const versionParams = z.strictObject({ recipeId: idParam, versionId: idParam });

export interface RecipeDetail {
  id: number;
  name: string;
  style: string;
  description: string;
  status: RecipeStatus;
  versions: VersionSummary[];
}

export interface VersionDetail {
  recipe: { id: number; name: string; style: string; description: string; status: RecipeStatus };
  version: VersionSummary & { content: RecipeVersionContent };
  computed: ComputedRecipe;
}

export interface Comparison {
  recipe: VersionDetail['recipe'];
  a: VersionDetail;
  b: VersionDetail;
  differences: Difference[];
}

export interface ScaleResult {
  recipe: { id: number; name: string; style: string };
  version: { id: number; number: number; frozen: boolean; content: RecipeVersionContent };
  source: { equipmentProfileId: number; equipment: EquipmentProfile };
  target: { equipmentProfileId: number; equipment: EquipmentProfile };
  scaled: ScaledRecipe;
}

/** A saved version, as the editor needs to go on from it. */
export interface SavedVersion {
  id: number;
  number: number;
}

export const recipeRoutes = {
  list: route<RecipeListRow[]>()({ method: 'get', path: '/api/recipes' }),
  create: route<{ id: number; versionId: number; versionNumber: number }>()({
    method: 'post',
    path: '/api/recipes',
    body: createRecipeSchema,
  }),
  get: route<RecipeDetail>()({ method: 'get', path: '/api/recipes/:recipeId', params: recipeParams }),
  update: route<Omit<RecipeDetail, 'versions'>>()({
    method: 'patch',
    path: '/api/recipes/:recipeId',
    params: recipeParams,
    body: updateRecipeSchema,
  }),
  addVersion: route<SavedVersion>()({
    method: 'post',
    path: '/api/recipes/:recipeId/versions',
    params: recipeParams,
    body: saveVersionSchema,
  }),
  compare: route<Comparison>()({
    method: 'get',
    path: '/api/recipes/:recipeId/compare',
    params: recipeParams,
    query: compareQuerySchema,
  }),
  getVersion: route<VersionDetail>()({
    method: 'get',
    path: '/api/recipes/:recipeId/versions/:versionId',
    params: versionParams,
  }),
  updateVersion: route<SavedVersion>()({
    method: 'patch',
    path: '/api/recipes/:recipeId/versions/:versionId',
    params: versionParams,
    body: saveVersionSchema,
  }),
  scale: route<ScaleResult>()({
    method: 'get',
    path: '/api/recipes/:recipeId/versions/:versionId/scale',
    params: versionParams,
    query: scaleQuerySchema,
  }),
  saveScaled: route<SavedVersion>()({
    method: 'post',
    path: '/api/recipes/:recipeId/versions/:versionId/scaled',
    params: versionParams,
    body: saveScaledSchema,
  }),
};

export type EquipmentRow = EquipmentProfile & { id: number };
const equipmentParams = z.strictObject({ equipmentId: idParam });

export const equipmentRoutes = {
  list: route<EquipmentRow[]>()({ method: 'get', path: '/api/equipment' }),
  create: route<EquipmentRow>()({ method: 'post', path: '/api/equipment', body: equipmentSchema }),
  update: route<EquipmentRow>()({
    method: 'put',
    path: '/api/equipment/:equipmentId',
    params: equipmentParams,
    body: equipmentSchema,
  }),
  remove: route()({ method: 'delete', path: '/api/equipment/:equipmentId', params: equipmentParams }),
};

export interface IngredientRow {
  id: number;
  kind: IngredientKind;
  name: string;
  ppg: number | null;
  colourLovibond: number | null;
  alphaAcidPct: number | null;
  attenuationPct: number | null;
  notes: string;
  typical: boolean;
}
const ingredientParams = z.strictObject({ ingredientId: idParam });

export const ingredientRoutes = {
  list: route<IngredientRow[]>()({ method: 'get', path: '/api/ingredients', query: ingredientQuerySchema }),
  create: route<IngredientRow>()({ method: 'post', path: '/api/ingredients', body: ingredientSchema }),
  update: route<IngredientRow>()({
    method: 'put',
    path: '/api/ingredients/:ingredientId',
    params: ingredientParams,
    body: ingredientSchema,
  }),
  remove: route()({ method: 'delete', path: '/api/ingredients/:ingredientId', params: ingredientParams }),
};
