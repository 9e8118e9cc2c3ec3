import { Logger } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { errorBody } from './error-body';

const logger = new Logger('Errors');

/**
 * Answers errors raised by Express middleware (CSRF refusal, malformed or oversized body) right
 * where they happen. Registered after the body parsers so no later error handler sees them: the
 * one `@nestjs/serve-static` adds turns every error on an excluded path into a 404.
 */
export function answerMiddlewareErrors(err: unknown, _req: Request, res: Response, next: NextFunction): void {
  if (res.headersSent) return next(err);
  const body = errorBody(err);
  if (body.statusCode >= 500) logger.error(err instanceof Error ? err.stack : String(err));
  res.status(body.statusCode).json(body);
}
