import { Logger } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { errorBody } from './error-body';
import { inReaderLanguage, readerLanguage } from './reader-language';

const logger = new Logger('Errors');

/**
 * Answers errors raised by Express middleware (CSRF refusal, malformed or oversized body) right
 * where they happen. Registered after the body parsers so no later error handler can answer them
 * with another status (a static-file handler once turned them all into 404s).
 */
export function answerMiddlewareErrors(err: unknown, req: Request, res: Response, next: NextFunction): void {
  if (res.headersSent) return next(err);
  const body = errorBody(err);
  if (body.statusCode >= 500) logger.error(err instanceof Error ? err.stack : String(err));
  res.status(body.statusCode).json(inReaderLanguage(body, readerLanguage(req)));
}
