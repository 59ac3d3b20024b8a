import type { z } from 'zod';

/**
 * One route's contract: its method, full path, zod schemas and answer type. The server's
 * defineRouter and the client's `call` read the same object, so a change to either side's
 * expectations is a type error on the other.
 */
export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteContract {
  method: Method;
  /** Full path in Express syntax (e.g. '/api/cellar/batches/:batchId'). */
  path: string;
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  /** The body arrives as a multipart form (a file upload), not JSON. */
  multipart?: true;
  /** Type-level only: what the route answers. Never set at run time. */
  readonly response?: unknown;
}

/** Declares a route answering `Res`: `route<BatchDetail>()({ method: 'get', path: '/api/batches/:id', params })`. */
export const route =
  <Res = void>() =>
  <const C extends Omit<RouteContract, 'response'>>(contract: C): C & { readonly response?: Res } =>
    contract;

export type ResponseOf<C extends RouteContract> = Exclude<C['response'], undefined>;

type Parsed<S> = S extends z.ZodType ? z.output<S> : Record<string, never>;
/** What the server's handler receives once a part is validated. */
export type ParamsOut<C extends RouteContract> = Parsed<C['params']>;
export type QueryOut<C extends RouteContract> = Parsed<C['query']>;
export type BodyOut<C extends RouteContract> = Parsed<C['body']>;

/** `'/a/:x/b/:y'` → `{ x: string | number; y: string | number }`; a path without parameters gives `{}`. */
export type PathParams<P extends string> = P extends `${string}:${infer Name}/${infer Rest}`
  ? { [K in Name]: string | number } & PathParams<`/${Rest}`>
  : P extends `${string}:${infer Name}`
    ? { [K in Name]: string | number }
    : Record<never, never>;

/** The path with its `:name` segments filled in. */
export function pathOf(path: string, params: Record<string, string | number> = {}): string {
  return path.replace(/:(\w+)/g, (_, name: string) => {
    const value = params[name];
    if (value === undefined) throw new Error(`Missing path parameter ${name} for ${path}`);
    return encodeURIComponent(String(value));
  });
}
