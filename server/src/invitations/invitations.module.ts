import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Invitation } from './invitation.entity';

@Module({
  imports: [MikroOrmModule.forFeature([Invitation])],
})
export class InvitationsModule {}
