import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { mailConfig } from '../config/mail.config';
import { MailService } from './mail.service';
import { MailOutbox } from './mail-outbox.service';

@Module({
  imports: [ConfigModule.forFeature(mailConfig)],
  providers: [MailService, MailOutbox],
  exports: [MailService, MailOutbox],
})
export class MailModule {}
