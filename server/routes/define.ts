import { Router, type Request, type Response } from 'express';
import type { z } from 'zod';
import { authorise } from '../middlewares/authorise';
import type { Action } from '../../shared/policy';
import { validate } from '../middlewares/validate';
import type { RequestHandler } from 'express';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteDef {
  method: Method;
  /** Path relative to the router's base, Express syntax (e.g. '/:id'). */
  path: string;
  /** The policy action the route performs (shared/policy.ts decides who may). */
  access: Action;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** Extra middleware between authorisation and validation (e.g. a rate limiter or an upload parser). */
  before?: RequestHandler[];
  handler: (req: Request, res: Response) => unknown;
}

export interface RouteEntry {
  method: Method;
  path: string;
  access: Action;
  hasBody: boolean;
  /** The route's validators, so the bad-input test can tell a refused request from an accepted one. */
  schemas: { params?: z.ZodType; query?: z.ZodType; body?: z.ZodType };
}

/** Every route the API serves: the role matrix and cross-brewery tests are generated from it. */
export const routeTable: RouteEntry[] = [];

/** Builds a router in the one shape every route takes: authorise → validate → thin handler. */
export function defineRouter(base: string, defs: RouteDef[]): Router {
  const router = Router();
  for (const def of defs) {
    const chain: RequestHandler[] = [authorise(def.access), ...(def.before ?? [])];
    if (def.params) chain.push(validate('params', def.params));
    if (def.query) chain.push(validate('query', def.query));
    if (def.body) chain.push(validate('body', def.body));
    router[def.method](def.path, ...chain, async (req: Request, res: Response) => {
      await def.handler(req, res);
    });
    const path = `${base}${def.path === '/' ? '' : def.path}`;
    if (!routeTable.some((r) => r.method === def.method && r.path === path)) {
      routeTable.push({
        method: def.method,
        path,
        access: def.access,
        hasBody: Boolean(def.body),
        schemas: { params: def.params, query: def.query, body: def.body },
      });
    }
  }
  return router;
}

/** The signed-in person (routes with access other than 'public' only). */
export function actor(req: Request): Express.User {
  if (!req.user) throw new Error('actor() called on a public route');
  return req.user;
}
