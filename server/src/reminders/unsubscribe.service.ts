import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { EntityManager } from '@mikro-orm/postgresql';
import { serverWordsFor, type Language } from '@broodsilk/shared';
import { appConfig } from '../config/app.config';
import { User } from '../users/user.entity';
import { ReminderPreferencesService } from './reminder-preferences.service';
import { readUnsubscribeToken } from './unsubscribe-token';
import { unsubscribePage } from './unsubscribe-page';

/**
 * The signed links in reminder e-mails: they work without signing in, the signature being the
 * proof. A good link speaks the account's language; a changed, made-up or orphaned one speaks the
 * browser's (`Accept-Language`) and changes nothing.
 */
@Injectable()
export class UnsubscribeService {
  constructor(
    private readonly em: EntityManager,
    private readonly preferences: ReminderPreferencesService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /** The page a link opens in a browser, with its HTTP status (a bad link is a 400 a person can read). */
  async page(token: string, browser: Language): Promise<{ status: number; html: string }> {
    const found = readUnsubscribeToken(this.app.jwtSecret, token);
    if (!found) return { status: 400, html: unsubscribePage(browser, { step: 'bad-link' }) };
    const user = await this.em.findOne(User, found.userId, { fields: ['language'] });
    if (!user) return { status: 404, html: unsubscribePage(browser, { step: 'account-gone' }) };
    return { status: 200, html: unsubscribePage(user.language, { step: 'ask', kind: found.kind }) };
  }

  /** Stops the kind's e-mails (a mail client's one-click POST, RFC 8058, or the page's button) and says so. */
  async stop(token: string, browser: Language): Promise<string> {
    const t = serverWordsFor(browser);
    const found = readUnsubscribeToken(this.app.jwtSecret, token);
    if (!found) throw new BadRequestException({ message: t('reminders.unsubscribe.badLink') });
    const language = await this.preferences.stopEmails(found.userId, found.kind);
    if (!language) throw new NotFoundException({ message: t('reminders.unsubscribe.accountGone') });
    return unsubscribePage(language, { step: 'done', kind: found.kind });
  }
}
