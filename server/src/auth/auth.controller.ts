import { Body, Controller, Get, HttpCode, Inject, Patch, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import type { Request, Response } from 'express';
import {
  DEFAULT_LANGUAGE,
  EMAIL_CONFIRMATION_HOURS,
  RESET_LINK_MINUTES,
  type CsrfResponse,
  type EmailConfirmationResult,
  type LoginResponse,
  type Me,
  type RegisterResponse,
  type SignInResult,
} from '@broodsilk/shared';
import { say } from '../common/refusal';
import { appConfig } from '../config/app.config';
import { Public } from '../common/decorators/public.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CSRF } from '../common/csrf/csrf.provider';
import type { Csrf } from '../common/csrf/csrf';
import { AuthService, type IssuedSession } from './auth.service';
import { RegisterDto } from './dto/register.dto';
import { LoginDto } from './dto/login.dto';
import { PasswordResetConfirmDto, PasswordResetDto } from './dto/password-reset.dto';
import { ChangePasswordDto } from './dto/change-password.dto';
import { EmailConfirmationDto, EmailConfirmationResendDto } from './dto/email-confirmation.dto';
import { EmailConfirmations } from './email-confirmations.service';
import { SecondFactorSignInDto } from './second-factor/dto/second-factor.dto';
import { clearSessionCookie, startSession } from './session-cookie';
import { SignInRequestGuard } from './sign-in-request.guard';
import { SignInAddressGuard } from './sign-in-address.guard';
import type { AuthUser } from '../common/auth-user';

@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly confirmations: EmailConfirmations,
    @Inject(CSRF) private readonly csrf: Csrf,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /** The same answer for a new and a taken address; the e-mail tells them apart. */
  @Public()
  @UseGuards(SignInAddressGuard, SignInRequestGuard)
  @HttpCode(202)
  @Post('register')
  async register(@Body() dto: RegisterDto): Promise<RegisterResponse> {
    await this.auth.register(dto);
    return { message: 'Check your e-mail: we have sent a message to this address with the next step.' };
  }

  /** The link from the confirmation e-mail: confirms the address, accepts the invitation it carries, and signs in unless a second factor is set up. */
  @Public()
  @UseGuards(SignInAddressGuard, SignInRequestGuard)
  @HttpCode(200)
  @Post('confirm-email')
  async confirmEmail(@Body() dto: EmailConfirmationDto, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<EmailConfirmationResult> {
    const { user, invitation, invitationProblem } = await this.confirmations.confirm(dto.token);
    const session = user.totpEnabledAt ? null : this.startSession(this.auth.issue(user), req, res);
    return { session, invitation, ...(invitationProblem ? { invitationProblem } : {}) };
  }

  @Public()
  @UseGuards(SignInAddressGuard)
  @HttpCode(202)
  @Post('confirm-email/resend')
  async resendConfirmation(@Body() dto: EmailConfirmationResendDto): Promise<{ message: string }> {
    await this.confirmations.requestAgain(dto.email);
    return { message: say(DEFAULT_LANGUAGE, 'page.auth.sentAgain', { hours: EMAIL_CONFIRMATION_HOURS }) };
  }

  @Public()
  @UseGuards(SignInAddressGuard, SignInRequestGuard)
  @HttpCode(200)
  @Post('login')
  async login(@Body() dto: LoginDto, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<SignInResult> {
    const result = await this.auth.login(dto, req.ip ?? 'unknown');
    return 'pendingToken' in result ? result : this.startSession(result, req, res);
  }

  /** The second step of a sign-in with a second factor: the pending token and a code give the session. */
  @Public()
  @UseGuards(SignInAddressGuard, SignInRequestGuard)
  @HttpCode(200)
  @Post('login/second-factor')
  async loginSecondFactor(@Body() dto: SecondFactorSignInDto, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<LoginResponse> {
    return this.startSession(await this.auth.completeSignIn(dto.pendingToken, dto.code, req.ip ?? 'unknown'), req, res);
  }

  @HttpCode(204)
  @Post('logout')
  async logout(@CurrentUser() user: AuthUser, @Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.logout(user.id);
    clearSessionCookie(req, res, this.app.secureCookies);
  }

  @Get('me')
  me(@CurrentUser() user: AuthUser): Promise<Me> {
    return this.auth.me(user.id);
  }

  /** Changing the password ends every other session; this one gets a fresh token. */
  @Patch('password')
  async changePassword(
    @CurrentUser() user: AuthUser,
    @Body() dto: ChangePasswordDto,
    @Req() req: Request,
    @Res({ passthrough: true }) res: Response,
  ): Promise<LoginResponse> {
    return this.startSession(await this.auth.changePassword(user.id, dto.currentPassword, dto.newPassword), req, res);
  }

  /** A fresh CSRF token for the current session (after a reload the client asks again). */
  @Public()
  @Get('csrf')
  csrfToken(@Req() req: Request, @Res({ passthrough: true }) res: Response): CsrfResponse {
    return { csrfToken: this.csrf.generateCsrfToken(req, res, { overwrite: true }) };
  }

  @Public()
  @UseGuards(SignInAddressGuard)
  @HttpCode(202)
  @Post('password-reset')
  async requestReset(@Body() dto: PasswordResetDto): Promise<{ message: string }> {
    await this.auth.requestPasswordReset(dto.email);
    return { message: say(DEFAULT_LANGUAGE, 'page.auth.resetSent', { minutes: RESET_LINK_MINUTES }) };
  }

  @Public()
  @UseGuards(SignInAddressGuard)
  @HttpCode(204)
  @Post('password-reset/confirm')
  async confirmReset(@Body() dto: PasswordResetConfirmDto): Promise<void> {
    await this.auth.confirmPasswordReset(dto.token, dto.password);
  }

  private startSession(session: IssuedSession, req: Request, res: Response): LoginResponse {
    return startSession(this.csrf, session, req, res, this.app.secureCookies);
  }
}
