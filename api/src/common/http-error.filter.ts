import { ArgumentsHost, Catch, ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { STATUS_CODES } from 'node:http';
import type { ErrorBody } from './error-body.js';
import { TooManyRequestsException } from './too-many-requests.exception.js';

/**
 * Turns every exception into `{ statusCode, error, message, details? }`. Unknown errors become a 500
 * with a generic message; the stack goes to the log, never to the client.
 */
@Catch()
export class HttpErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('HttpError');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode >= 500)
      this.logger.error(
        exception instanceof Error ? (exception.stack ?? exception.message) : String(exception),
      );
    if (response.headersSent) return;
    if (exception instanceof TooManyRequestsException)
      response.setHeader('Retry-After', String(exception.retryAfterSeconds));
    // A route that answers CSV or HTML sets its Content-Type (and a CSV's attachment name) before
    // its pipes run; an error from those is still the JSON error shape, shown, not downloaded.
    response.removeHeader('Content-Disposition');
    response.setHeader('Content-Type', 'application/json; charset=utf-8');
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ErrorBody {
    if (!(exception instanceof HttpException)) {
      return {
        statusCode: 500,
        error: 'Internal Server Error',
        message: 'Something went wrong on the server; it has been logged.',
      };
    }
    const statusCode = exception.getStatus();
    const error = STATUS_CODES[statusCode] ?? 'Error';
    const raw = exception.getResponse();
    if (typeof raw === 'string') return { statusCode, error, message: raw };
    const r = raw as { message?: unknown; details?: unknown[] };
    let message: string;
    let details = r.details;
    if (Array.isArray(r.message)) {
      // Nest's own ValidationPipe without our exceptionFactory, or multer/array messages.
      message = r.message.map(String).join('; ');
      details ??= r.message;
    } else {
      message = typeof r.message === 'string' ? r.message : exception.message;
    }
    return details === undefined ? { statusCode, error, message } : { statusCode, error, message, details };
  }
}
