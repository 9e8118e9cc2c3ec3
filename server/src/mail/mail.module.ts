import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { mailConfig } from '../config/mail.config';
import { JobsModule } from '../jobs/jobs.module';
import { MailService } from './mail.service';
import { MailOutbox } from './mail-outbox.service';

@Module({
  imports: [ConfigModule.forFeature(mailConfig), JobsModule],
  providers: [MailService, MailOutbox],
  exports: [MailService, MailOutbox],
})
export class MailModule {}
