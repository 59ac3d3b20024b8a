/**
 * The API's error contract. Every refusal answers `{ error: { code, message, fields?, retryable } }` with a code
 * from this table; `retryable` says whether sending the same request again, unchanged, can succeed. A client
 * decides what to do from the code (the device outbox retries, pauses or sets an entry aside), never from the
 * bare HTTP status.
 */
export const API_ERRORS = {
  /** Fields are wrong: `fields` names each one. */
  invalid: { status: 400, retryable: false },
  invalid_json: { status: 400, retryable: false },
  /** A password check failed (401 at sign-in, 400 when a signed-in person re-enters theirs). */
  wrong_password: { status: 401, retryable: false },
  /** The session ended: the same request succeeds after signing in again. */
  unauthenticated: { status: 401, retryable: true },
  forbidden: { status: 403, retryable: false },
  not_found: { status: 404, retryable: false },
  method_not_allowed: { status: 405, retryable: false },
  /** It clashes with what is there (a name in use, a vessel holding another batch). */
  conflict: { status: 409, retryable: false },
  /** The batch has not reached the stage this needs yet (a reading sent before the knockout that precedes it). */
  not_yet: { status: 409, retryable: true },
  /** Refused for good: the brew day is signed off, so only corrections follow its entries. */
  signed_off: { status: 409, retryable: false },
  /** Refused for good: the batch is past the stage this needs (packaged, released or dumped). */
  batch_closed: { status: 409, retryable: false },
  too_large: { status: 413, retryable: false },
  unsupported_type: { status: 415, retryable: false },
  unprocessable: { status: 422, retryable: false },
  /** Well-formed input that brewing cannot produce (percentages that do not add up). */
  impossible: { status: 422, retryable: false },
  too_many_attempts: { status: 429, retryable: true },
  internal: { status: 500, retryable: true },
  unavailable: { status: 503, retryable: true },
  storage_unavailable: { status: 503, retryable: true },
} as const satisfies Record<string, { status: number; retryable: boolean }>;

export type ApiErrorCode = keyof typeof API_ERRORS;

export interface ApiErrorBody {
  error: {
    code: ApiErrorCode;
    message: string;
    fields?: Record<string, string>;
    retryable: boolean;
    requestId?: string;
  };
}

export const isApiErrorCode = (code: unknown): code is ApiErrorCode =>
  typeof code === 'string' && Object.hasOwn(API_ERRORS, code);

/** The JSON body of a refusal. */
export function errorBody(
  code: ApiErrorCode,
  message: string,
  fields?: Record<string, string>,
  requestId?: string,
): ApiErrorBody {
  return {
    error: {
      code,
      message,
      ...(fields ? { fields } : {}),
      retryable: API_ERRORS[code].retryable,
      ...(requestId ? { requestId } : {}),
    },
  };
}

/**
 * The code of an answer: the one it carries, or, for an answer without one (a proxy's error page), what its
 * status can only mean: a server or gateway failure and a 429 pass, a 401 is a session to renew, anything else
 * is refused as it stands.
 */
export function errorCodeOf(status: number, body: unknown): ApiErrorCode {
  const code = (body as { error?: { code?: unknown } } | null)?.error?.code;
  if (isApiErrorCode(code)) return code;
  if (status >= 500) return 'unavailable';
  if (status === 429) return 'too_many_attempts';
  if (status === 401) return 'unauthenticated';
  return 'invalid';
}
