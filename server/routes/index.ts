import type { Router } from 'express';
import { authRouter } from './auth';
import { teamRouter, breweryRouter } from './team';
import { recipesRouter } from './recipes';
import { equipmentRouter } from './equipment';
import { ingredientsRouter } from './ingredients';
import { batchesRouter } from './batches';
import { vesselsRouter, cellarRouter } from './cellar';
import { tastingRouter } from './tasting';
import { batchAttachmentsRouter, attachmentsRouter } from './attachments';
import { taproomRouter, releaseRouter } from './taproom';
import { reportsRouter } from './reports';

/** Every API router and where it is mounted. Each area adds its line here. */
export const apiRouters: [string, Router][] = [
  ['/api/auth', authRouter],
  ['/api/team', teamRouter],
  ['/api/brewery', breweryRouter],
  ['/api/recipes', recipesRouter],
  ['/api/equipment', equipmentRouter],
  ['/api/ingredients', ingredientsRouter],
  ['/api/batches', batchesRouter],
  ['/api/vessels', vesselsRouter],
  ['/api/cellar', cellarRouter],
  ['/api/batches', tastingRouter],
  ['/api/batches', batchAttachmentsRouter],
  ['/api/batches', releaseRouter],
  ['/api/attachments', attachmentsRouter],
  ['/api/taproom', taproomRouter],
  ['/api/reports', reportsRouter],
];
