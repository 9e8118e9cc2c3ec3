import { registerAs } from '@nestjs/config';
import { databaseUrls } from '../database/database-urls';

/** The app's own (runtime) connection; the owner's (DATABASE_OWNER_URL) is for migrations only. */
export const databaseConfig = registerAs('database', () => ({
  url: databaseUrls().runtime,
}));
