import { Module } from '@nestjs/common';
import { JobsService } from './jobs.service';

/** The app's one pg-boss instance (schema `pgboss`), shared by every feature that queues work. */
@Module({
  providers: [JobsService],
  exports: [JobsService],
})
export class JobsModule {}
