import { Test } from '@nestjs/testing';
import type { INestApplication } from '@nestjs/common';
import { MIKRO_ORM_MODULE_OPTIONS } from '@mikro-orm/nestjs';
import { MikroORM } from '@mikro-orm/postgresql';
import type { MigrationObject } from '@mikro-orm/core';
import { AppModule } from '../../src/app.module';
import { databaseConfig } from '../../src/config/database.config';
import { configureApp } from '../../src/app.setup';
import { baseOrmOptions } from '../../src/mikro-orm.config';
import { JOBS_SCHEMA, installJobQueues } from '../../src/jobs/job-queues';

// Node cannot require .ts migrations, so the migrator gets them as a list.
const modules = import.meta.glob<Record<string, new () => unknown>>('../../src/migrations/Migration*.ts', { eager: true });
export const migrationsList: MigrationObject[] = Object.entries(modules)
  .map(([path, mod]) => {
    const name = path.split('/').pop()!.replace(/\.ts$/, '');
    return { name, class: mod[name] as MigrationObject['class'] };
  })
  .sort((a, b) => a.name.localeCompare(b.name));

export interface TestApp {
  app: INestApplication;
  orm: MikroORM;
  close(): Promise<void>;
}

/**
 * The real AppModule against the test database, migrated up from empty. The tests' role owns the
 * database, so it also installs the job queues first (as `npm run migrate` does before the app starts).
 */
export async function createTestApp(options: { fresh?: boolean; runtimeUrl?: string } = { fresh: true }): Promise<TestApp> {
  const url = options.runtimeUrl ?? process.env.DATABASE_URL!;
  if (!options.runtimeUrl) await installJobQueues(url);
  const base = baseOrmOptions(url);
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(databaseConfig.KEY)
    .useValue({ url })
    .overrideProvider(MIKRO_ORM_MODULE_OPTIONS)
    .useValue({ ...base, autoLoadEntities: true, registerRequestContext: true, migrations: { ...base.migrations, migrationsList } })
    .compile();
  const app = moduleRef.createNestApplication({ rawBody: true });
  configureApp(app);
  await app.init();
  const orm = app.get(MikroORM) as unknown as MikroORM;
  if (options.fresh !== false && !options.runtimeUrl) {
    await resetDatabase(orm);
  }
  return { app, orm, close: () => app.close() };
}

/** Empties the test database completely (enum types and queued jobs included) and migrates it up from nothing. */
export async function resetDatabase(orm: MikroORM): Promise<void> {
  await orm.em.getConnection().execute('drop schema if exists public cascade; create schema public;');
  // Jobs left by an earlier file (pg-boss keeps its own schema) belong to records that are gone.
  await orm.em.getConnection().execute(`delete from ${JOBS_SCHEMA}.job`);
  await orm.getMigrator().up();
}
