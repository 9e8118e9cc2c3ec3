import { Controller, Get, Query } from '@nestjs/common';
import type { ActivityEventResponse } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { ActivityService } from './activity.service';
import { ActivityTimelineQueryDto } from './activity-timeline-query.dto';

@Controller('projects/:projectId/activity')
export class ActivityController {
  constructor(private readonly activity: ActivityService) {}

  @Get()
  @AnyProjectMember()
  timeline(@CurrentProject() access: ProjectAccess, @Query() query: ActivityTimelineQueryDto): Promise<ActivityEventResponse[]> {
    return this.activity.timeline(access.project.id, access.role, query);
  }
}
