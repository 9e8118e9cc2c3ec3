import { BadRequestException, Controller, Get, HttpCode, Inject, Param, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import { ConfigType } from '@nestjs/config';
import { appConfig } from '../config/app.config';
import { Public } from '../common/decorators/public.decorator';
import { ReminderPreferencesService } from './reminder-preferences.service';
import { readUnsubscribeToken } from './unsubscribe-token';
import { unsubscribePage } from './unsubscribe-page';
import { MAIL_WORDS } from './reminder-words';

/**
 * The signed links in reminder e-mails: they work without signing in, the signature being the
 * proof. A mail client's one-click POST (RFC 8058) and the page's button stop the kind's e-mails;
 * a changed or made-up link is a 400 and changes nothing.
 */
@Public()
@Controller('unsubscribe')
export class UnsubscribeController {
  constructor(
    private readonly preferences: ReminderPreferencesService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  private read(token: string) {
    const found = readUnsubscribeToken(this.app.jwtSecret, token);
    if (!found) throw new BadRequestException({ message: MAIL_WORDS.badLink });
    return found;
  }

  @Get(':token')
  show(@Param('token') token: string, @Res({ passthrough: true }) res: Response): string {
    const { kind } = this.read(token);
    res.type('html');
    return unsubscribePage({ title: MAIL_WORDS.unsubscribeConfirm(kind), message: MAIL_WORDS.why(kind), button: MAIL_WORDS.unsubscribeButton });
  }

  @Post(':token')
  @HttpCode(200)
  async stop(@Param('token') token: string, @Res({ passthrough: true }) res: Response): Promise<string> {
    const { userId, kind } = this.read(token);
    await this.preferences.stopEmails(userId, kind);
    res.type('html');
    return unsubscribePage({ title: MAIL_WORDS.unsubscribeButton, message: MAIL_WORDS.unsubscribed(kind), button: null });
  }
}
