import { Router, type Request, type RequestHandler, type Response } from 'express';
import type { z } from 'zod';
import type { BodyOut, Method, ParamsOut, QueryOut, ResponseOf, RouteContract } from '../../shared/contract/route';
import { authorise } from '../middlewares/authorise';
import type { Action } from '../../shared/policy';
import { validate } from '../middlewares/validate';

/** What a handler receives: the validated parts, the signed-in person and the raw request and response. */
export interface HandlerContext<C extends RouteContract> {
  params: ParamsOut<C>;
  query: QueryOut<C>;
  body: BodyOut<C>;
  /** The signed-in person; reading it on a public route with nobody signed in throws (use `req.user` there). */
  user: Express.User;
  req: Request;
  /** `res.json` takes only the contract's answer type. */
  res: Response<ResponseOf<C>>;
}

export interface RouteImplementation<C extends RouteContract> {
  /** The policy action the route performs (shared/policy.ts decides who may). */
  access: Action;
  /** Extra middleware between authorisation and validation (e.g. a rate limiter or an upload parser). */
  before?: RequestHandler[];
  handler: (ctx: HandlerContext<C>) => unknown;
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

/**
 * Builds the router mounted at `base` for a group of contracts, in the one shape every route takes:
 * authorise → validate → thin handler. Every contract in the group must have its implementation.
 */
export function defineRouter<G extends { [K in keyof G]: RouteContract }>(
  base: string,
  contracts: G,
  implementations: { [K in keyof G]: RouteImplementation<G[K]> },
): Router {
  const router = Router();
  for (const name in contracts) {
    const contract: RouteContract = contracts[name];
    const def: RouteImplementation<RouteContract> = implementations[name];
    if (!contract.path.startsWith(base)) throw new Error(`${contract.path} is not under ${base}`);
    const path = contract.path.slice(base.length) || '/';
    const chain: RequestHandler[] = [authorise(def.access), ...(def.before ?? [])];
    if (contract.params) chain.push(validate('params', contract.params));
    if (contract.query) chain.push(validate('query', contract.query));
    if (contract.body) chain.push(validate('body', contract.body));
    router[contract.method](path, ...chain, async (req: Request, res: Response) => {
      await def.handler({
        params: req.params,
        query: req.query,
        body: req.body,
        get user() {
          if (!req.user) throw new Error(`${contract.path} read the signed-in person on a public route`);
          return req.user;
        },
        req,
        res,
      });
    });
    if (!routeTable.some((r) => r.method === contract.method && r.path === contract.path)) {
      routeTable.push({
        method: contract.method,
        path: contract.path,
        access: def.access,
        hasBody: Boolean(contract.body),
        schemas: { params: contract.params, query: contract.query, body: contract.body },
      });
    }
  }
  return router;
}
