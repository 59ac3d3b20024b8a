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
import { API_ERRORS, errorBody, type ApiErrorCode } from '../../shared/schemas/errors';

interface BodyParserError {
  type?: string;
  status?: number;
}

/** The one error path: named errors, body-parser and ORM errors → status + JSON; anything else → 500 with a request id. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let code: ApiErrorCode = 'internal';
  let message = 'Something went wrong on our side. Your data is safe; try again in a moment.';
  let fields: Record<string, string> | undefined;
  const parserError = err as BodyParserError;

  if (err instanceof HttpError) {
    ({ code, message, fields } = err);
  } else if (err instanceof BrewingInputError) {
    // Well-formed input that brewing cannot produce (e.g. percentages that do not add up).
    code = 'impossible';
    message = err.message;
    fields = { [err.field]: err.message };
  } else if (parserError.type === 'entity.parse.failed') {
    code = 'invalid_json';
    message = 'The request body is not valid JSON';
  } else if (parserError.type === 'entity.too.large') {
    code = 'too_large';
    message = 'The request is too large';
  } else if (err instanceof URIError && parserError.status === 400) {
    // The router could not decode a path segment (e.g. a stray '%').
    code = 'invalid';
    message = 'The address is not valid';
  } else if (parserError.type && parserError.status && parserError.status < 500) {
    // e.g. a charset or content encoding the parser does not take (415), or a body cut short (400).
    code = parserError.status === 415 ? 'unsupported_type' : 'invalid';
    message = 'The request could not be read';
  } else if (err instanceof UniqueConstraintError) {
    code = 'conflict';
    message = 'This already exists';
  } else if (err instanceof ForeignKeyConstraintError) {
    code = 'conflict';
    message = 'This refers to something that does not exist or is still in use';
  } else if (err instanceof ValidationError) {
    code = 'invalid';
    message = 'Some fields need attention';
    fields = Object.fromEntries(err.errors.map((e) => [e.path ?? '_', e.message]));
  } else if (
    err instanceof ConnectionError ||
    (err instanceof DatabaseError && /ECONNREFUSED|ECONNRESET|closed|pool/i.test(String(err.message)))
  ) {
    code = 'unavailable';
    message = 'The database is not answering. Nothing was saved; try again in a moment.';
  }

  const status = err instanceof HttpError ? err.status : API_ERRORS[code].status;
  if (status >= 500) req.log?.error({ err }, 'request failed');
  res.locals.errorCode = code; // read by the sign-in limiter
  res
    .status(status)
    .json(
      errorBody(
        code,
        message,
        fields,
        typeof req.id === 'string' || typeof req.id === 'number' ? String(req.id) : undefined,
      ),
    );
};

export const notFoundHandler: RequestHandler = (_req, _res, next) => next(notFound('This address'));
