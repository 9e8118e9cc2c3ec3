import { HttpException, HttpStatus } from '@nestjs/common';
import { NotFoundError, UniqueConstraintViolationException, ForeignKeyConstraintViolationException } from '@mikro-orm/core';
import { CSRF_OUT_OF_DATE, type ApiErrorBody, type FieldError } from '@broodsilk/shared';
import { refusal, type RefusalKey } from '../refusal';

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
/** The body of a fixed refusal: its reason phrase and its sentence with the key. */
const fixed = (status: number, key: RefusalKey): ApiErrorBody => ({ statusCode: status, error: REASON[status] ?? 'Error', ...refusal(key) });

/** The one `ApiErrorBody` for any error, from a controller or from Express middleware (in English; see `inReaderLanguage`). */
export function errorBody(exception: unknown): ApiErrorBody {
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const raw = exception.getResponse();
    let message = exception.message;
    let details: FieldError[] | undefined;
    let reason: string | undefined;
    let keyed: Pick<ApiErrorBody, 'key' | 'values'> = {};
    if (typeof raw === 'object' && raw !== null) {
      const r = raw as { message?: unknown; details?: FieldError[]; reason?: unknown; key?: unknown; values?: ApiErrorBody['values'] };
      if (typeof r.message === 'string') message = r.message;
      else if (Array.isArray(r.message)) message = r.message.join('; ');
      if (Array.isArray(r.details)) details = r.details;
      if (typeof r.reason === 'string') reason = r.reason;
      if (typeof r.key === 'string') keyed = { key: r.key, ...(r.values ? { values: r.values } : {}) };
    }
    return { statusCode: status, error: REASON[status] ?? 'Error', message, ...keyed, ...(details ? { details } : {}), ...(reason ? { reason } : {}) };
  }
  if (exception instanceof NotFoundError) return fixed(404, 'common.notFound');
  if (exception instanceof UniqueConstraintViolationException) return fixed(409, 'common.duplicate');
  if (exception instanceof ForeignKeyConstraintViolationException) return fixed(409, 'common.stillUsed');
  if (isExposedHttpError(exception)) {
    // http-errors from Express middleware (body parser, CSRF): known ones are said in our words, others as written for clients.
    const status = exception.status;
    if (exception.type === 'entity.parse.failed') return fixed(status, 'common.badJson');
    if (status === 413) return fixed(status, 'common.tooLarge');
    if (exception.code === 'EBADCSRFTOKEN') return { ...fixed(status, 'common.csrfOutOfDate'), reason: CSRF_OUT_OF_DATE };
    return { statusCode: status, error: REASON[status] ?? 'Error', message: exception.message };
  }
  return fixed(HttpStatus.INTERNAL_SERVER_ERROR, 'common.serverError');
}

function isExposedHttpError(e: unknown): e is { status: number; type?: string; code?: string; message: string } {
  const x = e as { status?: unknown; expose?: unknown } | null;
  return typeof x === 'object' && x !== null && typeof x.status === 'number' && x.status >= 400 && x.status < 500 && x.expose === true;
}
