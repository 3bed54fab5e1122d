import {
  ArgumentsHost,
  Catch,
  ExceptionFilter,
  HttpException,
  HttpStatus,
  Logger,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import { DomainError, type DomainErrorKind } from '../errors/domain-error';

/** The one error body every route returns. */
export interface ApiErrorBody {
  code: string;
  message: string;
  details?: unknown;
}

const KIND_STATUS: Record<DomainErrorKind, number> = {
  invalid: HttpStatus.BAD_REQUEST,
  not_found: HttpStatus.NOT_FOUND,
  conflict: HttpStatus.CONFLICT,
  too_large: HttpStatus.PAYLOAD_TOO_LARGE,
  forbidden: HttpStatus.FORBIDDEN,
  unauthenticated: HttpStatus.UNAUTHORIZED,
  throttled: HttpStatus.TOO_MANY_REQUESTS,
  unavailable: HttpStatus.SERVICE_UNAVAILABLE,
};

const STATUS_CODE: Record<number, string> = {
  400: 'BAD_REQUEST',
  401: 'NOT_SIGNED_IN',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  405: 'METHOD_NOT_ALLOWED',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  429: 'TOO_MANY_REQUESTS',
  503: 'SERVICE_UNAVAILABLE',
};

/** Maps every error to `{ code, message, details? }` with a fitting status. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const ctx = host.switchToHttp();
    const res = ctx.getResponse<Response>();
    const req = ctx.getRequest<Request>();
    const { status, body } = this.toBody(exception, req);
    const retry = (body.details as { retryAfterSeconds?: unknown } | undefined)?.retryAfterSeconds;
    if (status === 429 && typeof retry === 'number') res.setHeader('Retry-After', String(retry));
    if (status >= 500)
      this.logger.error(`${req.method} ${req.url}: ${(exception as Error)?.stack ?? exception}`);
    res.status(status).json(body);
  }

  private toBody(exception: unknown, req: Request): { status: number; body: ApiErrorBody } {
    if (exception instanceof DomainError) {
      const body: ApiErrorBody = { code: exception.code, message: exception.message };
      if (exception.details !== undefined) body.details = exception.details;
      return { status: KIND_STATUS[exception.kind], body };
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      if (status === 404 && /^Cannot /.test(exception.message)) {
        return {
          status,
          body: { code: 'ROUTE_NOT_FOUND', message: `No route ${req.method} ${req.path}.` },
        };
      }
      const response = exception.getResponse();
      const message =
        typeof response === 'object' && response !== null && 'message' in response
          ? String((response as { message: unknown }).message)
          : exception.message;
      return { status, body: { code: STATUS_CODE[status] ?? `HTTP_${status}`, message } };
    }
    return {
      status: 500,
      body: {
        code: 'INTERNAL_ERROR',
        message:
          'Something failed on the server; it has been logged. Try again, and report it if it persists.',
      },
    };
  }
}
