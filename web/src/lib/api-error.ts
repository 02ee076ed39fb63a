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
    message: `The server answered ${status}.`,
  });
}

/** One sentence for the user; never a stack trace. */
export function describeError(error: unknown): string {
  if (error instanceof ApiError) return `${error.message} (${error.statusCode} ${error.error})`;
  if (error instanceof TypeError)
    return 'The server could not be reached. Check the connection and try again.';
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
