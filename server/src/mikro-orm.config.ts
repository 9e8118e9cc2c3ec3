import { defineConfig, PostgreSqlDriver, type Options } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';
import { databaseUrls } from './database/database-urls';

/**
 * Options shared by the Nest module (which adds `autoLoadEntities`, each
 * feature registering its own entities) and the CLI (which finds the compiled
 * entities by path). Schema changes only ever come from migrations.
 */
export function baseOrmOptions(url: string): Options {
  return {
    driver: PostgreSqlDriver,
    clientUrl: url,
    extensions: [Migrator],
    migrations: {
      path: 'dist/migrations',
      pathTs: 'src/migrations',
      transactional: true,
      allOrNothing: true,
      // Diffs are taken against a migrated database, not a snapshot file, so
      // parallel feature branches cannot disagree about a stale snapshot.
      snapshot: false,
    },
    forceUtcTimezone: true,
    debug: false,
  };
}

/** The CLI's configuration (`npx mikro-orm …`, `npm run migrate`, the other CLIs): the owner's connection. */
export default defineConfig({
  ...baseOrmOptions(databaseUrls().owner),
  entities: ['dist/**/*.entity.js'],
  entitiesTs: ['src/**/*.entity.ts'],
});
