import { Entity, PrimaryKey, Property } from '@mikro-orm/core';

/** One sign-in counter of rate-limiter-flexible's RateLimiterPostgres (sign-in-limits.ts); mapped only so the schema matches the entities. */
@Entity({ tableName: 'rate_limits' })
export class RateLimitRow {
  @PrimaryKey({ type: 'string', length: 255 })
  key!: string;

  @Property({ type: 'integer', default: 0 })
  points!: number;

  /** Unix milliseconds; null for a counter that never expires. */
  @Property({ type: 'bigint', nullable: true })
  expire?: string | null;
}
