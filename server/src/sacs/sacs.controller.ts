import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import type { SacResponse } from '@broodsilk/shared';
import { AnyProjectMember, CurrentProject, ProjectFrom, ProjectRoles } from '../projects/project-roles.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { SacsService } from './sacs.service';
import { CreateSacDto } from './dto/create-sac.dto';
import { UpdateSacDto } from './dto/update-sac.dto';

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

@Controller('sacs')
export class SacsController {
  constructor(private readonly sacs: SacsService) {}

  @Get(':id')
  @AnyProjectMember()
  @ProjectFrom('sac')
  get(@CurrentProject() a: ProjectAccess, @CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string): Promise<SacResponse> {
    return this.sacs.get(a, user, id);
  }

  @Patch(':id')
  @ProjectRoles('owner')
  @ProjectFrom('sac')
  update(
    @CurrentProject() a: ProjectAccess,
    @CurrentUser() user: AuthUser,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateSacDto,
  ): Promise<SacResponse> {
    return this.sacs.update(a, user, id, dto);
  }
}
