import { Body, Controller, Get, Post } from '@nestjs/common';
import type { PairingResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AnyProjectMember, CurrentProject, ProjectRoles } from './project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from './project-access.service';
import { PairingsService } from './pairings.service';
import { CreatePairingDto } from './dto/create-pairing.dto';

@Controller('projects/:projectId/pairings')
export class PairingsController {
  constructor(private readonly pairings: PairingsService) {}

  @Get()
  @AnyProjectMember()
  list(@CurrentProject() access: ProjectAccess): Promise<PairingResponse[]> {
    return this.pairings.list(access);
  }

  @Post()
  @ProjectRoles('owner')
  create(@CurrentUser() user: AuthUser, @CurrentProject() access: ProjectAccess, @Body() dto: CreatePairingDto): Promise<PairingResponse> {
    return this.pairings.create(user, access, dto);
  }
}
