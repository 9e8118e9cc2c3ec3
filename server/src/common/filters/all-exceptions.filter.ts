import { ArgumentsHost, Catch, ExceptionFilter, Logger } from '@nestjs/common';
import type { Request, Response } from 'express';
import { errorBody } from './error-body';
import { inReaderLanguage, readerLanguage } from './reader-language';

/** Turns every error into the one `ApiErrorBody` shape, in the reader's language; internals never leak. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const res = http.getResponse<Response>();
    const body = errorBody(exception);
    if (body.statusCode >= 500) this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    res.status(body.statusCode).json(inReaderLanguage(body, readerLanguage(http.getRequest<Request>())));
  }
}
