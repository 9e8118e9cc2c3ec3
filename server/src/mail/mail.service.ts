import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import { mailConfig } from '../config/mail.config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
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

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.from, ...mail });
    this.logger.log(`mail "${mail.subject}" sent`);
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
