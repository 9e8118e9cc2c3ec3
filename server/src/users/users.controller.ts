import { Body, Controller, Inject, Patch, Req, Res } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import type { Request, Response } from 'express';
import type { LoginResponse, Me } from '@broodsilk/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CSRF } from '../common/csrf/csrf.provider';
import type { Csrf } from '../common/csrf/csrf';
import { appConfig } from '../config/app.config';
import { AuthService } from '../auth/auth.service';
import { startSession } from '../auth/session-cookie';
import type { AuthUser } from '../auth/auth-user';
import { UsersService } from './users.service';
import { UpdateProfileDto } from './dto/update-profile.dto';
import { ChangePasswordDto } from './dto/change-password.dto';

@Controller('users/me')
export class UsersController {
  constructor(
    private readonly users: UsersService,
    private readonly auth: AuthService,
    @Inject(CSRF) private readonly csrf: Csrf,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  @Patch()
  update(@CurrentUser() user: AuthUser, @Body() dto: UpdateProfileDto): Promise<Me> {
    return this.users.updateProfile(user.id, dto);
  }

  /** Changing the password ends every other session; this one gets a fresh token. */
  @Patch('password')
  async changePassword(
    @CurrentUser() user: AuthUser,
    @Body() dto: ChangePasswordDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<LoginResponse> {
    return startSession(this.csrf, await this.auth.changePassword(user.id, dto.currentPassword, dto.newPassword), req, res, this.app.secureCookies);
  }
}
