import { Module } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { ActivityModule } from '../activity/activity.module';
import { PhotosModule } from '../photos/photos.module';
import { ProjectsModule } from '../projects/projects.module';
import { ProgressLink } from './progress-link.entity';
import { ProgressLinksService } from './progress-links.service';
import { MemberProgressLinksController, ProgressController } from './progress-links.controller';

/** Read-only progress pages for outside parties; other modules (partner updates) use `ProgressLinksService.issue`. */
@Module({
  imports: [MikroOrmModule.forFeature([ProgressLink]), ActivityModule, PhotosModule, ProjectsModule],
  controllers: [MemberProgressLinksController, ProgressController],
  providers: [ProgressLinksService],
  exports: [ProgressLinksService],
})
export class ProgressLinksModule {}
