/** The API's error body: `{ statusCode, error, message, details? }`. */
export interface ApiErrorBody {
  readonly statusCode: number;
  readonly error: string;
  readonly message: string | readonly string[];
  readonly details?: unknown;
}

/** A failed API call, carrying the server's own explanation. */
export class ApiError extends Error {
  readonly statusCode: number;
  readonly error: string;
  readonly details?: unknown;

  constructor(body: ApiErrorBody) {
    super(Array.isArray(body.message) ? body.message.join('; ') : String(body.message));
    this.name = 'ApiError';
    this.statusCode = body.statusCode;
    this.error = body.error;
    this.details = body.details;
  }
}

export function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return typeof v.statusCode === 'number' && (typeof v.message === 'string' || Array.isArray(v.message));
}

/** Builds an ApiError from whatever a failed response carried. */
export function toApiError(status: number, statusText: string, body: unknown): ApiError {
  if (isApiErrorBody(body)) return new ApiError(body);
  return new ApiError({
    statusCode: status,
    error: statusText || 'Error',
    message:
      status >= 500
        ? 'The service could not do this just now. Try again in a moment.'
        : 'The service did not accept this request.',
  });
}

const STATUS_WORDS: Record<string, string> = {
  raised: 'Raised',
  answered: 'Answered',
  returned: 'Returned',
  accepted: 'Accepted',
  waived: 'Waived',
  resolved: 'Resolved',
};

/**
 * A headline in the user's words for a failed change (a toast title), never the HTTP status:
 * "Someone else changed this first" rather than "409 Conflict".
 */
export function errorTitle(error: unknown): string {
  if (!(error instanceof ApiError))
    return error instanceof TypeError ? 'No connection to the service' : 'Something went wrong';
  const s = error.statusCode;
  if (s === 409) return changedMeanwhile(error) ? 'Someone else changed this first' : 'Not possible now';
  if (s === 400 || s === 422) return 'Check what you entered';
  if (s === 401) return 'Please sign in again';
  if (s === 403) return 'Not allowed for your role';
  if (s === 404) return 'Not found';
  if (s === 410) return 'No longer available';
  if (s === 413) return 'Too large';
  if (s === 429) return 'Too many attempts';
  if (s === 503) return 'The service cannot store this just now';
  return s >= 500 ? 'The service could not do this' : 'Not done';
}

/**
 * The state a change lost to, when the server says someone else's change came first (its
 * compare-and-set found another version): `{ status, label }`, else null.
 */
export function changedMeanwhile(error: unknown): { status: string; label: string } | null {
  if (!(error instanceof ApiError) || error.statusCode !== 409 || !Array.isArray(error.details)) return null;
  if (!/^Someone else changed/.test(error.message)) return null;
  const first = error.details[0] as { status?: unknown } | undefined;
  if (typeof first?.status !== 'string') return null;
  return { status: first.status, label: STATUS_WORDS[first.status] ?? first.status };
}

/** One sentence for the user, in their words: never a status code or a stack trace. */
export function describeError(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof TypeError)
    return 'The server could not be reached. Check the connection and try again.';
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
