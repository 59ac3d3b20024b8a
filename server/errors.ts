import { amountsMessage, type Amount, type AmountsMessage } from '../shared/quantities';

/** An error the client caused or may see: mapped to a status code and a plain message. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** The message with its amounts as data: the error handler words it in the person's units. */
    readonly worded?: AmountsMessage,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'invalid', message, fields);
export const unauthenticated = (message = 'Sign in to continue') => new HttpError(401, 'unauthenticated', message);
/**
 * A password check that failed. The sign-in limiter counts exactly these (by code), never a malformed body.
 * Sign-in answers 401; a signed-in person re-entering their password answers 400, as 401 would mean "signed out".
 */
export const wrongPassword = (status: 400 | 401, message: string, fields?: Record<string, string>) =>
  new HttpError(status, 'wrong_password', message, fields);
export const forbidden = (message = 'Your role does not allow this') => new HttpError(403, 'forbidden', message);
export const notFound = (what = 'This item') => new HttpError(404, 'not_found', `${what} was not found`);
export const methodNotAllowed = (message: string) => new HttpError(405, 'method_not_allowed', message);
export const conflict = (message: string) => new HttpError(409, 'conflict', message);
export const unprocessable = (message: string) => new HttpError(422, 'unprocessable', message);
/** A 422 whose `{name}` slots are amounts in SI, worded in the signed-in brewery's units when answered. */
export function unprocessableAmounts(text: string, amounts: Record<string, Amount>): HttpError {
  const { message, worded } = amountsMessage(text, amounts);
  return new HttpError(422, 'unprocessable', message, undefined, worded);
}
export const tooLarge = (message: string) => new HttpError(413, 'too_large', message);
