import type { Router } from 'express';
import { authRouter } from './auth';
import { teamRouter, breweryRouter } from './team';

/** Every API router and where it is mounted. Each area adds its line here. */
export const apiRouters: [string, Router][] = [
  ['/api/auth', authRouter],
  ['/api/team', teamRouter],
  ['/api/brewery', breweryRouter],
];
