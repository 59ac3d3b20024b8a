import type { z } from 'zod';
import { pathOf, type PathParams, type ResponseOf, type RouteContract } from '../../shared/contract/route';

/** An answer from the API that was not a success, with the server's message and field messages. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

async function request<T>(
  method: RouteContract['method'],
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      method: method.toUpperCase(),
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        // Every write carries this header; the server refuses writes without it (cross-site request guard).
        'x-kettlewright': '1',
        // A FormData body (a file upload) sets its own multipart Content-Type with the boundary.
        ...(body !== undefined && !(body instanceof FormData) ? { 'Content-Type': 'application/json' } : {}),
        ...headers,
      },
      body: body instanceof FormData ? body : body !== undefined ? JSON.stringify(body) : undefined,
    });
  } catch {
    throw new ApiError(0, 'offline', 'No connection to Kettlewright. Check the network and try again.');
  }
  if (response.status === 204) return undefined as T;
  const data: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const error = (data as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null)
      ?.error;
    throw new ApiError(
      response.status,
      error?.code ?? 'error',
      error?.message ?? `The server answered ${response.status}`,
      error?.fields,
    );
  }
  return data as T;
}

type Fields<S> = S extends z.ZodType ? z.input<S> & Partial<z.output<S>> : never;
/** `{ part: T }`, or `{ part?: T }` when every field of T may be left out. */
type Part<Name extends string, T> = [T] extends [never]
  ? { [K in Name]?: undefined }
  : Record<never, never> extends T
    ? { [K in Name]?: T }
    : { [K in Name]: T };

/** What a call sends: the path's parameters, the query and the body its contract names, and extra headers. */
export type CallInput<C extends RouteContract> = Part<
  'params',
  keyof PathParams<C['path']> extends never ? never : PathParams<C['path']>
> &
  Part<'query', Fields<C['query']>> &
  Part<'body', C['multipart'] extends true ? FormData : Fields<C['body']>> & { headers?: Record<string, string> };

function search(query: object | undefined): string {
  const pairs = Object.entries(query ?? {})
    .filter(([, v]) => v !== undefined && v !== '')
    .map(([k, v]) => [k, String(v)]);
  return pairs.length ? `?${new URLSearchParams(pairs)}` : '';
}

/** Calls a route of shared/contract: the path, query and body are typed by its schemas, the answer by its response. */
export function call<C extends RouteContract>(
  route: C,
  ...[input]: Record<never, never> extends CallInput<C> ? [input?: CallInput<C>] : [input: CallInput<C>]
): Promise<ResponseOf<C>> {
  const url = pathOf(route.path, input?.params) + search(input?.query);
  const body = route.method === 'get' || route.method === 'delete' ? undefined : (input?.body ?? {});
  return request<ResponseOf<C>>(route.method, url, body, input?.headers);
}
