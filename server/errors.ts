import { API_ERRORS, type ApiErrorCode } from '../shared/schemas/errors';
import { BATCH_STATUSES, type BatchStatus } from '../shared/schemas/batches';

/** An error the client caused or may see: a code from the shared error contract, its status, and a plain message. */
export class HttpError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    readonly status: number = API_ERRORS[code].status,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError('invalid', message, fields);
export const unauthenticated = (message = 'Sign in to continue') => new HttpError('unauthenticated', message);
/**
 * A password check that failed. The sign-in limiter counts exactly these (by code), never a malformed body.
 * Sign-in answers 401; a signed-in person re-entering their password answers 400, as 401 would mean "signed out".
 */
export const wrongPassword = (status: 400 | 401, message: string, fields?: Record<string, string>) =>
  new HttpError('wrong_password', message, fields, status);
export const forbidden = (message = 'Your role does not allow this') => new HttpError('forbidden', message);
export const notFound = (what = 'This item') => new HttpError('not_found', `${what} was not found`);
export const methodNotAllowed = (message: string) => new HttpError('method_not_allowed', message);
export const conflict = (message: string) => new HttpError('conflict', message);
/** The brew day is signed off: its entries take corrections only, now and on any retry. */
export const signedOff = (message: string) => new HttpError('signed_off', message);
export const unprocessable = (message: string) => new HttpError('unprocessable', message);
export const tooLarge = (message: string) => new HttpError('too_large', message);

/**
 * A write that needs the batch at one of the `allowed` stages: `not_yet` while the batch has not reached them
 * (an entry sent before the one that moves it on; a retry can succeed), `batch_closed` once it is past them.
 */
export function wrongStage(status: BatchStatus, allowed: readonly BatchStatus[], message: string): HttpError {
  const first = Math.min(...allowed.map((s) => BATCH_STATUSES.indexOf(s)));
  return new HttpError(BATCH_STATUSES.indexOf(status) < first ? 'not_yet' : 'batch_closed', message);
}
