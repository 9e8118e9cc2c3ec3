import { Migration } from '@mikro-orm/migrations';

/** Sign-in counters shared by every API instance, in the layout rate-limiter-flexible's RateLimiterPostgres uses. */
export class Migration20261202140000 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "rate_limits" ("key" varchar(255) not null, "points" integer not null default 0, "expire" bigint null, constraint "rate_limits_pkey" primary key ("key"));`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "rate_limits";`);
  }
}
