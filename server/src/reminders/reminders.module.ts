import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { SacsModule } from '../sacs/sacs.module';
import { MailModule } from '../mail/mail.module';
import { ReminderSent } from './reminder-sent.entity';
import { Notification } from './notification.entity';
import { RemindersService } from './reminders.service';
import { ReminderJobsService } from './reminder-jobs.service';
import { NotificationsService } from './notifications.service';
import { NotificationsController } from './notifications.controller';

@Module({
  imports: [MikroOrmModule.forFeature([ReminderSent, Notification]), SacsModule, MailModule],
  controllers: [NotificationsController],
  providers: [RemindersService, ReminderJobsService, NotificationsService],
  exports: [RemindersService],
})
export class RemindersModule {}
