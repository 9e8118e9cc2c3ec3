import { ConfigService } from '@nestjs/config';
import { createCsrf } from './csrf';

export const CSRF = Symbol('CSRF');

/** One csrf-csrf instance shared by the middleware (see app.setup) and the auth controller. */
export const csrfProvider = {
  provide: CSRF,
  inject: [ConfigService],
  useFactory: (config: ConfigService) => createCsrf(config.getOrThrow<string>('app.csrfSecret'), config.get<boolean>('app.secureCookies') ?? false),
};
