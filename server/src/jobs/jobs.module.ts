import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { databaseConfig } from '../config/database.config';
import { JobsService } from './jobs.service';

/** The app's one pg-boss instance (schema `pgboss`), shared by every feature that queues work. */
@Module({
  imports: [ConfigModule.forFeature(databaseConfig)],
  providers: [JobsService],
  exports: [JobsService],
})
export class JobsModule {}
