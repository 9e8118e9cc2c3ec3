import { Body, Controller, Get, Param, Patch, Post, Put } from '@nestjs/common';
import type { IncubatorRightsResponse, SacResponse } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { SacsService } from './sacs.service';
import { CreateSacDto } from './dto/create-sac.dto';
import { UpdateSacDto } from './dto/update-sac.dto';
import { PullSacDto } from './dto/pull-sac.dto';
import { IncubatorRightsDto } from './dto/incubator-rights.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('projects/:projectId/sacs')
export class ProjectSacsController {
  constructor(private readonly sacs: SacsService) {}

  @Get()
  @AnyProjectMember()
  list(@CurrentProject() a: ProjectAccess, @CurrentUser() user: AuthUser): Promise<SacResponse[]> {
    return this.sacs.list(a, user);
  }

  @Post()
  @ProjectRoles('owner')
  create(@CurrentProject() a: ProjectAccess, @CurrentUser() user: AuthUser, @Body() dto: CreateSacDto): Promise<SacResponse> {
    return this.sacs.create(a, user, dto);
  }
}

/** The owner lets caretakers record the pull and the opening of the project's sacs (or stops them). */
@Controller('projects/:projectId/incubator-rights')
export class IncubatorRightsController {
  constructor(private readonly sacs: SacsService) {}

  @Put()
  @ProjectRoles('owner')
  set(@CurrentProject() a: ProjectAccess, @CurrentUser() user: AuthUser, @Body() dto: IncubatorRightsDto): Promise<IncubatorRightsResponse> {
    return this.sacs.setIncubatorRights(a, user, dto);
  }
}

@Controller('sacs')
export class SacsController {
  constructor(private readonly sacs: SacsService) {}

  @Get(':id')
  @AnyProjectMember()
  @ProjectFrom('sac')
  get(@CurrentProject() a: ProjectAccess, @CurrentUser() user: AuthUser, @Param('id', RecordIdPipe) id: string): Promise<SacResponse> {
    return this.sacs.get(a, user, id);
  }

  @Patch(':id')
  @ProjectRoles('owner')
  @ProjectFrom('sac')
  update(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: UpdateSacDto,
  ): Promise<SacResponse> {
    return this.sacs.update(a, user, id, dto);
  }

  /** Caretakers reach the service, which refuses them unless the project allows it. */
  @Post(':id/pull')
  @ProjectRoles('owner', 'caretaker')
  @ProjectFrom('sac')
  pull(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', RecordIdPipe) id: string,
    @Body() dto: PullSacDto,
  ): Promise<SacResponse> {
    return this.sacs.pull(a, user, id, dto);
  }
}
