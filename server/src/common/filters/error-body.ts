import { HttpException, HttpStatus } from '@nestjs/common';
import { NotFoundError, UniqueConstraintViolationException, ForeignKeyConstraintViolationException } from '@mikro-orm/core';
import type { ApiErrorBody, FieldError } from '@broodsilk/shared';

const REASON: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
  502: 'Bad Gateway',
  503: 'Service Unavailable',
};

/** The one `ApiErrorBody` for any error, from a controller or from Express middleware. */
export function errorBody(exception: unknown): ApiErrorBody {
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const raw = exception.getResponse();
    let message = exception.message;
    let details: FieldError[] | undefined;
    let reason: string | undefined;
    if (typeof raw === 'object' && raw !== null) {
      const r = raw as { message?: unknown; details?: FieldError[]; reason?: unknown };
      if (typeof r.message === 'string') message = r.message;
      else if (Array.isArray(r.message)) message = r.message.join('; ');
      if (Array.isArray(r.details)) details = r.details;
      if (typeof r.reason === 'string') reason = r.reason;
    }
    return { statusCode: status, error: REASON[status] ?? 'Error', message, ...(details ? { details } : {}), ...(reason ? { reason } : {}) };
  }
  if (exception instanceof NotFoundError) {
    return { statusCode: 404, error: REASON[404], message: 'That record does not exist or is not yours to see.' };
  }
  if (exception instanceof UniqueConstraintViolationException) {
    return { statusCode: 409, error: REASON[409], message: 'A record with these details already exists.' };
  }
  if (exception instanceof ForeignKeyConstraintViolationException) {
    return { statusCode: 409, error: REASON[409], message: 'This record is still used elsewhere and cannot be changed that way.' };
  }
  if (isExposedHttpError(exception)) {
    // http-errors from Express middleware (body parser, CSRF): their messages are written for clients.
    const status = exception.status;
    const message =
      exception.type === 'entity.parse.failed' ? 'The request body is not valid JSON.' : status === 413 ? 'The request is too large.' : exception.message;
    return { statusCode: status, error: REASON[status] ?? 'Error', message };
  }
  return { statusCode: HttpStatus.INTERNAL_SERVER_ERROR, error: REASON[500], message: 'Something went wrong on our side. Please try again.' };
}

function isExposedHttpError(e: unknown): e is { status: number; type?: string; message: string } {
  const x = e as { status?: unknown; expose?: unknown } | null;
  return typeof x === 'object' && x !== null && typeof x.status === 'number' && x.status >= 400 && x.status < 500 && x.expose === true;
}
