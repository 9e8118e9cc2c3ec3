import { BadGatewayException, Inject, Injectable, Logger, OnModuleDestroy, ServiceUnavailableException } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import { mailConfig } from '../config/mail.config';
import { refusal } from '../common/refusal';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  /** Extra headers, e.g. RFC 8058 one-click unsubscribe. */
  headers?: Record<string, string>;
}

/** Real SMTP through nodemailer; locally it points at the mail sink. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;

  constructor(@Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>) {
    this.transport = nodemailer.createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      auth: config.user ? { user: config.user, pass: config.password } : undefined,
      ignoreTLS: !config.secure && config.host === '127.0.0.1',
    });
  }

  /** Sends now. A refusal by the mail server is a 502, an unreachable server a 503; nothing is half-sent. */
  async send(mail: OutgoingMail): Promise<void> {
    try {
      await this.transport.sendMail({ from: this.config.from, ...mail });
    } catch (e) {
      const code = (e as { responseCode?: unknown }).responseCode;
      this.logger.error(`mail "${mail.subject}" not sent: ${e instanceof Error ? e.message : String(e)}`);
      if (typeof code === 'number' && code >= 500) {
        throw new BadGatewayException(refusal('request.mailRefused', { to: String(mail.to) }));
      }
      throw new ServiceUnavailableException(refusal('request.mailUnreachable'));
    }
    this.logger.log(`mail "${mail.subject}" sent`);
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
