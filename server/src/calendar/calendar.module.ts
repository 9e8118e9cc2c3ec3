import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { SacsModule } from '../sacs/sacs.module';
import { AnimalsModule } from '../animals/animals.module';
import { CalendarFeed } from './calendar-feed.entity';
import { CalendarService } from './calendar.service';
import { CalendarController } from './calendar.controller';

@Module({
  imports: [MikroOrmModule.forFeature([CalendarFeed]), SacsModule, AnimalsModule],
  controllers: [CalendarController],
  providers: [CalendarService],
})
export class CalendarModule {}
