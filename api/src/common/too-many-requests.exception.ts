import { HttpException, HttpStatus } from '@nestjs/common';

/** 429 with the seconds to wait; HttpErrorFilter sends them as the standard `Retry-After` header. */
export class TooManyRequestsException extends HttpException {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(message, HttpStatus.TOO_MANY_REQUESTS);
  }
}
