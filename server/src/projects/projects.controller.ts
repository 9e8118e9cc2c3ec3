import { Body, Controller, Get, HttpCode, Patch, Post } from '@nestjs/common';
import type { ProjectResponse, ProjectSummary } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AnyProjectMember, CurrentProject, ProjectRoles } from './project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from './project-access.service';
import { ProjectsService } from './projects.service';
import { CreateProjectDto } from './dto/create-project.dto';
import { UpdateProjectDto } from './dto/update-project.dto';
import { EndProjectDto } from './dto/end-project.dto';

@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<ProjectSummary[]> {
    return this.projects.list(user);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateProjectDto): Promise<ProjectResponse> {
    return this.projects.create(user, dto);
  }

  @Get(':id')
  @AnyProjectMember()
  get(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess): Promise<ProjectResponse> {
    return this.projects.get(user, access);
  }

  @Patch(':id')
  @ProjectRoles('owner')
  update(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: UpdateProjectDto): Promise<ProjectResponse> {
    return this.projects.update(user, access, dto);
  }

  @Post(':id/end')
  @HttpCode(200)
  @ProjectRoles('owner')
  end(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: EndProjectDto): Promise<ProjectResponse> {
    return this.projects.end(user, access, dto);
  }

  @Post(':id/close')
  @HttpCode(200)
  @ProjectRoles('owner')
  close(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess): Promise<ProjectResponse> {
    return this.projects.close(user, access);
  }

  @Post(':id/reopen')
  @HttpCode(200)
  @ProjectRoles('owner')
  reopen(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess): Promise<ProjectResponse> {
    return this.projects.reopen(user, access);
  }
}
