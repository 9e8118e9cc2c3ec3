import { Controller, Get } from '@nestjs/common';
import type { BalancesResponse } from '@broodsilk/shared';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { ProjectAccess } from '../projects/project-access.service';
import { BalancesService } from './balances.service';

@Controller('projects/:projectId/balances')
export class BalancesController {
  constructor(private readonly balances: BalancesService) {}

  @Get()
  @ProjectRoles('owner', 'partner')
  get(@CurrentProject() a: ProjectAccess): Promise<BalancesResponse> {
    return this.balances.balances(a);
  }
}
