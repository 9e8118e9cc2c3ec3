import { Controller, Get } from '@nestjs/common';
import type { DashboardResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { AuthUser } from '../common/auth-user';
import { DashboardService } from './dashboard.service';

/** Any signed-in user: it only ever shows the caller's own projects and animals. */
@Controller('dashboard')
export class DashboardController {
  constructor(private readonly dashboard: DashboardService) {}

  @Get()
  get(@CurrentUser() user: AuthUser): Promise<DashboardResponse> {
    return this.dashboard.forUser(user);
  }
}
