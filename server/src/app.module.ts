import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { PostgreSqlDriver } from '@mikro-orm/postgresql';
import { LoggerModule } from 'nestjs-pino';
import { appConfig } from './config/app.config';
import { databaseConfig } from './config/database.config';
import { mailConfig } from './config/mail.config';
import { validateEnv } from './config/validate-env';
import { baseOrmOptions } from './mikro-orm.config';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { RolesGuard } from './common/guards/roles.guard';
import { AuthModule } from './auth/auth.module';
import { UsersModule } from './users/users.module';
import { HealthModule } from './health/health.module';
import { SpeciesModule } from './species/species.module';
import { AnimalsModule } from './animals/animals.module';
import { PhotosModule } from './photos/photos.module';
import { ProjectsModule } from './projects/projects.module';
import { ActivityModule } from './activity/activity.module';
import { InvitationsModule } from './invitations/invitations.module';
import { SacsModule } from './sacs/sacs.module';
import { DashboardModule } from './dashboard/dashboard.module';
import { CalendarModule } from './calendar/calendar.module';
import { RemindersModule } from './reminders/reminders.module';
import { PartnerUpdatesModule } from './partner-updates/partner-updates.module';
import { ProjectRoleGuard } from './projects/project-role.guard';
import { ClockModule } from './common/clock.module';
import { AccountsModule } from './accounts/accounts.module';
import { SettlementsModule } from './settlements/settlements.module';
import { IdempotencyModule } from './idempotency/idempotency.module';
import { ExportModule } from './export/export.module';
import { ProgressLinksModule } from './progress-links/progress-links.module';

/** Calendar-feed, invitation and progress-link tokens travel in the path; they are secrets, so not logged. */
function redactSecrets(url: string): string {
  return url.split('?')[0].replace(/^(\/(?:api\/(?:calendar|invitations|progress)|progress)\/)[^/]+/, '$1[secret]');
}

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, cache: true, load: [appConfig, databaseConfig, mailConfig], validate: validateEnv }),
    LoggerModule.forRoot({
      pinoHttp: {
        level: process.env.LOG_LEVEL ?? 'info',
        // One short line per request: no headers, so no cookies or tokens can reach the log.
        serializers: {
          req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: redactSecrets(req.url) }),
          res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
        },
        autoLogging: { ignore: (req) => req.url === '/api/health' },
      },
    }),
    MikroOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({
        ...baseOrmOptions(config.getOrThrow<string>('database.url')),
        autoLoadEntities: true,
        registerRequestContext: true,
      }),
      // Registers the PostgreSQL-typed EntityManager and MikroORM for injection too.
      driver: PostgreSqlDriver,
    }),
    ClockModule,
    AuthModule,
    UsersModule,
    HealthModule,
    SpeciesModule,
    AnimalsModule,
    PhotosModule,
    ProjectsModule,
    ActivityModule,
    InvitationsModule,
    SacsModule,
    DashboardModule,
    CalendarModule,
    RemindersModule,
    PartnerUpdatesModule,
    AccountsModule,
    SettlementsModule,
    IdempotencyModule,
    ExportModule,
    ProgressLinksModule,
  ],
  providers: [
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
    // After authentication: checks @ProjectRoles(...) (see projects/README.md).
    { provide: APP_GUARD, useClass: ProjectRoleGuard },
  ],
})
export class AppModule {}
