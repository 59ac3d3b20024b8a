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
