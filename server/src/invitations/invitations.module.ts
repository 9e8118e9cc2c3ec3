import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { MailModule } from '../mail/mail.module';
import { ActivityModule } from '../activity/activity.module';
import { Invitation } from './invitation.entity';
import { InvitationsService } from './invitations.service';
import { InvitationsController, ProjectInvitationsController } from './invitations.controller';

@Module({
  imports: [MikroOrmModule.forFeature([Invitation]), MailModule, ActivityModule],
  controllers: [ProjectInvitationsController, InvitationsController],
  providers: [InvitationsService],
  exports: [InvitationsService],
})
export class InvitationsModule {}
