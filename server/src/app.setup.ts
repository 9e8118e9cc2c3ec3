import { ValidationPipe, type INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { ConfigService } from '@nestjs/config';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { validationExceptionFactory } from './common/filters/validation-exception.factory';
import { CSRF } from './common/csrf/csrf.provider';
import { bodyParsers } from './common/body/body-parsers';
import { answerMiddlewareErrors } from './common/filters/middleware-errors';
import { RefuseUnstorableTextPipe } from './common/pipes/refuse-unstorable-text.pipe';
import { parseTrustProxy } from './config/trust-proxy';
import { serveClient } from './common/static/serve-client';
import type { Csrf } from './common/csrf/csrf';

/** Everything main.ts and the tests must share, so tests exercise the real app. */
export function configureApp(app: INestApplication): INestApplication {
  const express = app as NestExpressApplication;
  express.useLogger(app.get(Logger));
  express.set('trust proxy', parseTrustProxy(process.env.TRUST_PROXY));
  express.disable('x-powered-by');
  app.setGlobalPrefix('api');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'script-src': ["'self'"], 'style-src': ["'self'", "'unsafe-inline'"] },
      },
    }),
  );
  const clientDist = app.get(ConfigService).get<string>('app.clientDist');
  if (clientDist) serveClient(app, clientDist);
  app.use(cookieParser());
  app.use(app.get<Csrf>(CSRF).doubleCsrfProtection);
  app.use(...bodyParsers());
  app.use(answerMiddlewareErrors);
  app.useGlobalPipes(
    new RefuseUnstorableTextPipe(),
    // `target` lets the factory tell a DTO's own sentence from class-validator's default (it never sends it).
    new ValidationPipe({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      validationError: { target: true },
      exceptionFactory: validationExceptionFactory,
    }),
  );
  app.enableShutdownHooks();
  return app;
}
