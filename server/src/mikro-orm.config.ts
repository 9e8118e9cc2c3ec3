import { defineConfig, PostgreSqlDriver, type Options } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';

export const DEFAULT_DATABASE_URL = 'postgres://app@127.0.0.1:54329/broodsilk';

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

/** The CLI's configuration (`npx mikro-orm …`, `npm run migrate`). */
export default defineConfig({
  ...baseOrmOptions(process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL),
  entities: ['dist/**/*.entity.js'],
  entitiesTs: ['src/**/*.entity.ts'],
});
