import type { ErrorRequestHandler, RequestHandler } from 'express';
import {
  UniqueConstraintError,
  ValidationError,
  ForeignKeyConstraintError,
  DatabaseError,
  ConnectionError,
} from 'sequelize';
import { HttpError, notFound } from '../errors';
import { BrewingInputError } from '../../shared/brewing';
import { wordAmounts } from '../../shared/quantities';

interface BodyParserError {
  type?: string;
  status?: number;
}

/** The one error path: named errors, body-parser and ORM errors → status + JSON; anything else → 500 with a request id. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let status = 500;
  let code = 'internal';
  let message = 'Something went wrong on our side. Your data is safe; try again in a moment.';
  let fields: Record<string, string> | undefined;
  const parserError = err as BodyParserError;

  // A message whose amounts travel as data is worded in the signed-in brewery's units.
  const system = req.user?.brewery.unitSystem ?? 'metric';
  if (err instanceof HttpError) {
    ({ status, code, message, fields } = err);
    if (err.worded) message = wordAmounts(err.worded, system);
  } else if (err instanceof BrewingInputError) {
    // Well-formed input that brewing cannot produce (e.g. percentages that do not add up).
    status = 422;
    code = 'impossible';
    message = err.worded ? wordAmounts(err.worded, system) : err.message;
    fields = { [err.field]: message };
  } else if (parserError.type === 'entity.parse.failed') {
    status = 400;
    code = 'invalid_json';
    message = 'The request body is not valid JSON';
  } else if (parserError.type === 'entity.too.large') {
    status = 413;
    code = 'too_large';
    message = 'The request is too large';
  } else if (err instanceof URIError && parserError.status === 400) {
    // The router could not decode a path segment (e.g. a stray '%').
    status = 400;
    code = 'invalid';
    message = 'The address is not valid';
  } else if (parserError.type && parserError.status && parserError.status < 500) {
    status = parserError.status;
    code = 'invalid';
    message = 'The request could not be read';
  } else if (err instanceof UniqueConstraintError) {
    status = 409;
    code = 'conflict';
    message = 'This already exists';
  } else if (err instanceof ForeignKeyConstraintError) {
    status = 409;
    code = 'conflict';
    message = 'This refers to something that does not exist or is still in use';
  } else if (err instanceof ValidationError) {
    status = 400;
    code = 'invalid';
    message = 'Some fields need attention';
    fields = Object.fromEntries(err.errors.map((e) => [e.path ?? '_', e.message]));
  } else if (
    err instanceof ConnectionError ||
    (err instanceof DatabaseError && /ECONNREFUSED|ECONNRESET|closed|pool/i.test(String(err.message)))
  ) {
    status = 503;
    code = 'unavailable';
    message = 'The database is not answering. Nothing was saved; try again in a moment.';
  }

  if (status >= 500) req.log?.error({ err }, 'request failed');
  res.locals.errorCode = code; // read by the sign-in limiter
  res.status(status).json({ error: { code, message, ...(fields ? { fields } : {}), requestId: req.id } });
};

export const notFoundHandler: RequestHandler = (_req, _res, next) => next(notFound('This address'));
