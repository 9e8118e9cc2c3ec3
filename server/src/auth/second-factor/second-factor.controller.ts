import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import type { RecoveryCodesResponse, SecondFactorStatus, TotpEnrolment } from '@broodsilk/shared';
import { CurrentUser } from '../../common/decorators/current-user.decorator';
import type { AuthUser } from '../../common/auth-user';
import { SecondFactorService } from './second-factor.service';
import { RecoveryCodesRenewalDto, SecondFactorRemovalDto, TotpConfirmDto } from './dto/second-factor.dto';
import { PerUserLimit } from '../../common/per-user-limit/per-user-limit';

/** Renewals of the recovery codes per account per hour; each one re-checks the password or a code. */
export const RECOVERY_CODE_RENEWALS_PER_HOUR = 10;

@Controller('auth/second-factor')
export class SecondFactorController {
  constructor(private readonly secondFactor: SecondFactorService) {}

  @Get()
  status(@CurrentUser() user: AuthUser): Promise<SecondFactorStatus> {
    return this.secondFactor.status(user.id);
  }

  @Post('enrolment')
  startEnrolment(@CurrentUser() user: AuthUser): Promise<TotpEnrolment> {
    return this.secondFactor.startEnrolment(user.id);
  }

  @HttpCode(200)
  @Post('enrolment/confirm')
  confirmEnrolment(@CurrentUser() user: AuthUser, @Body() dto: TotpConfirmDto): Promise<RecoveryCodesResponse> {
    return this.secondFactor.confirmEnrolment(user.id, dto);
  }

  /** New recovery codes, shown once; the old ones stop working. */
  @HttpCode(200)
  @Post('recovery-codes')
  @PerUserLimit({ what: 'recoveryCodeRenewals', limit: RECOVERY_CODE_RENEWALS_PER_HOUR, windowMinutes: 60 })
  renewRecoveryCodes(@CurrentUser() user: AuthUser, @Body() dto: RecoveryCodesRenewalDto): Promise<RecoveryCodesResponse> {
    return this.secondFactor.renewRecoveryCodes(user.id, dto);
  }

  @HttpCode(204)
  @Post('removal')
  remove(@CurrentUser() user: AuthUser, @Body() dto: SecondFactorRemovalDto): Promise<void> {
    return this.secondFactor.remove(user.id, dto);
  }
}
