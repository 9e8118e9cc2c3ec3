import { Body, Controller, Get, Post } from '@nestjs/common';
import type { CheckoutResponse, PayoutAccountResponse } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CurrentProject, ProjectRoles } from '../projects/project-roles.decorator';
import type { AuthUser } from '../common/auth-user';
import type { ProjectAccess } from '../projects/project-access.service';
import { PayoutAccountsService } from './payout-accounts.service';
import { CheckoutService } from './checkout.service';
import { CreatePayoutAccountDto } from './dto/create-payout-account.dto';
import { CreateCheckoutDto } from './dto/create-checkout.dto';

/** A keeper's own payout account: only ever their own, so no project role. */
@Controller('settlements/payout-account')
export class PayoutAccountController {
  constructor(private readonly payouts: PayoutAccountsService) {}

  @Get()
  status(@CurrentUser() u: AuthUser): Promise<PayoutAccountResponse> {
    return this.payouts.status(u);
  }

  @Post()
  link(@CurrentUser() u: AuthUser, @Body() dto: CreatePayoutAccountDto): Promise<PayoutAccountResponse> {
    return this.payouts.link(u, dto);
  }
}

@Controller('projects/:projectId/settlements')
export class ProjectSettlementsController {
  constructor(private readonly checkout: CheckoutService) {}

  @Post('checkout')
  @ProjectRoles('owner', 'partner')
  create(@CurrentProject() a: ProjectAccess, @CurrentUser() u: AuthUser, @Body() dto: CreateCheckoutDto): Promise<CheckoutResponse> {
    return this.checkout.create(a, u, dto);
  }
}
