import { Body, Controller, Delete, Get, HttpCode, Param, Post } from '@nestjs/common';
import type { ProjectMemberResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AnyProjectMember, CurrentProject, ProjectRoles } from './project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from './project-access.service';
import { MembersService } from './members.service';
import { AddMemberDto } from './dto/add-member.dto';
import { RecordIdPipe } from '../common/pipes/record-id.pipe';

@Controller('projects/:projectId/members')
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  @AnyProjectMember()
  list(@CurrentProject() access: ProjectAccess): Promise<ProjectMemberResponse[]> {
    return this.members.list(access);
  }

  @Post()
  @ProjectRoles('owner')
  add(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: AddMemberDto): Promise<ProjectMemberResponse> {
    return this.members.add(user, access, dto);
  }

  @Delete(':memberId')
  @HttpCode(204)
  @ProjectRoles('owner')
  remove(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Param('memberId', RecordIdPipe) memberId: string): Promise<void> {
    return this.members.remove(user, access, memberId);
  }
}
