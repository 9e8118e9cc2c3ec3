import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { PartnerUpdates } from './partner-updates.service';
import { FailureNoticeController } from './partner-updates.controller';

/** Partner updates: news of a shared project for its partners, written from the activity events. */
@Module({
  imports: [MailModule],
  controllers: [FailureNoticeController],
  providers: [PartnerUpdates],
  exports: [PartnerUpdates],
})
export class PartnerUpdatesModule {}
