import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { JobsModule } from '../jobs/jobs.module';
import { MailModule } from '../mail/mail.module';
import { ReminderSent } from './reminder-sent.entity';
import { Notification } from './notification.entity';
import { ReminderSettings } from './reminder-settings.entity';
import { ReminderPlanner } from './reminder-planner.service';
import { ReminderDelivery } from './reminder-delivery.service';
import { ReminderPreferencesService } from './reminder-preferences.service';
import { ReminderPreferencesController } from './reminder-preferences.controller';
import { UnsubscribeController } from './unsubscribe.controller';
import { UnsubscribeService } from './unsubscribe.service';
import { NotificationsService } from './notifications.service';
import { NotificationsController } from './notifications.controller';

@Module({
  imports: [MikroOrmModule.forFeature([ReminderSent, Notification, ReminderSettings]), JobsModule, MailModule],
  controllers: [NotificationsController, ReminderPreferencesController, UnsubscribeController],
  providers: [ReminderPlanner, ReminderDelivery, ReminderPreferencesService, UnsubscribeService, NotificationsService],
  exports: [ReminderPlanner],
})
export class RemindersModule {}
