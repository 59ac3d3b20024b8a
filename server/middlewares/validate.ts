import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { badRequest } from '../errors';
import { issueMessage } from '../../shared/quantities/field';
import type { UnitSystem } from '../../shared/quantities';

/**
 * Turns zod issues into one message per field, the shape forms show beside their inputs. A quantity's limit
 * is worded in the units of `system` (the signed-in person's brewery; metric before sign-in or where no
 * quantity can be refused, as in a write's headers).
 */
export function fieldMessages(error: z.ZodError, system: UnitSystem = 'metric'): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    if (!(key in fields)) {
      fields[key] =
        issue.code === 'unrecognized_keys'
          ? `Unknown field${issue.keys.length > 1 ? 's' : ''}: ${issue.keys.join(', ')}`
          : issueMessage(issue, system);
    }
  }
  return fields;
}

type Part = 'body' | 'query' | 'params';

/** Validates one part of the request with a shared zod schema and replaces it with the parsed value. */
export function validate(part: Part, schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    const result = schema.safeParse(req[part] ?? (part === 'body' ? undefined : {}));
    if (!result.success) {
      return next(
        badRequest('Some fields need attention', fieldMessages(result.error, req.user?.brewery.unitSystem ?? 'metric')),
      );
    }
    if (part === 'query') {
      // Express 5 exposes req.query as a getter: keep the parsed value beside it.
      Object.defineProperty(req, 'query', { value: result.data, writable: true, configurable: true });
    } else {
      (req as unknown as Record<string, unknown>)[part] = result.data;
    }
    next();
  };
}

/** A UTF-16 surrogate without its pair: no text, and MariaDB's utf8mb4 columns cannot hold it. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

interface Place {
  value: unknown;
  key?: string;
  parent?: Place;
}
const pathOf = (place: Place | undefined): string => {
  const keys: string[] = [];
  for (let p = place; p?.key !== undefined; p = p.parent) keys.unshift(p.key);
  return keys.length ? keys.join('.') : '_';
};

/** The path of the first key or string inside a parsed JSON body that holds a lone surrogate ('_' for the body itself). */
function malformedTextAt(body: unknown): string | null {
  // Iterative, each place linked to its parent: a body may nest thousands of levels deep.
  const stack: Place[] = [{ value: body }];
  while (stack.length) {
    const place = stack.pop()!;
    const { value } = place;
    if (typeof value === 'string') {
      if (LONE_SURROGATE.test(value)) return pathOf(place);
    } else if (Array.isArray(value)) {
      value.forEach((v, i) => stack.push({ value: v, key: String(i), parent: place }));
    } else if (value && typeof value === 'object') {
      for (const [key, v] of Object.entries(value)) {
        if (LONE_SURROGATE.test(key)) return pathOf(place);
        stack.push({ value: v, key, parent: place });
      }
    }
  }
  return null;
}

/** Whether an address's percent-escapes spell UTF-8 (a surrogate encoded in one does not). */
function decodes(url: string): boolean {
  try {
    decodeURIComponent(url.replace(/\+/g, ' '));
    return true;
  } catch {
    return false;
  }
}

/**
 * Refuses, before any route runs, input that is not text: an address (path or query) whose escapes are not
 * UTF-8, or a JSON body with a lone surrogate in a key or a string. Such text would reach the database mangled
 * or fail there after other writes, so every API request passes here once.
 */
export const wellFormedText: RequestHandler = (req, _res, next) => {
  if (!decodes(req.originalUrl)) return next(badRequest('The address is not valid'));
  const at = malformedTextAt(req.body);
  if (at !== null) {
    return next(
      badRequest('Some fields need attention', { [at]: 'This text holds a character that is not valid: retype it' }),
    );
  }
  next();
};
