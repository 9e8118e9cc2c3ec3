import { Module } from '@nestjs/common';
import { SacsModule } from '../sacs/sacs.module';
import { ProjectsModule } from '../projects/projects.module';
import { AnimalsModule } from '../animals/animals.module';
import { ActivityModule } from '../activity/activity.module';
import { DashboardService } from './dashboard.service';
import { DashboardController } from './dashboard.controller';

@Module({
  imports: [SacsModule, ProjectsModule, AnimalsModule, ActivityModule],
  controllers: [DashboardController],
  providers: [DashboardService],
})
export class DashboardModule {}
