import { Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { IdempotencyKey } from './idempotency-key.entity';
import { IdempotencyStore } from './idempotency.store';
import { IdempotencyInterceptor } from './idempotency.interceptor';

/** Button writes sent twice are written once (see idempotency.interceptor.ts). */
@Module({
  imports: [MikroOrmModule.forFeature([IdempotencyKey])],
  providers: [IdempotencyStore, { provide: APP_INTERCEPTOR, useClass: IdempotencyInterceptor }],
})
export class IdempotencyModule {}
