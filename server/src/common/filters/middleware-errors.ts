import { Logger } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { errorBody } from './error-body';

const logger = new Logger('Errors');

/**
 * Answers errors raised by Express middleware (CSRF refusal, malformed or oversized body) right
 * where they happen. Registered after the body parsers so no later error handler sees them: the
 * client-app module's page handlers would answer them with the client's 404 page.
 */
export function answerMiddlewareErrors(err: unknown, _req: Request, res: Response, next: NextFunction): void {
  if (res.headersSent) return next(err);
  const body = errorBody(err);
  if (body.statusCode >= 500) logger.error(err instanceof Error ? err.stack : String(err));
  res.status(body.statusCode).json(body);
}
