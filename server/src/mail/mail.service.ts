import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { createTransport, Transporter } from 'nodemailer';
import { mailConfig } from '../config/mail.config';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: string | Buffer; contentType?: string }[];
}

/** SMTP through nodemailer: the local capturing server in development and tests, a relay in production. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;

  constructor(@Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>) {
    this.transport = createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      ...(config.user ? { auth: { user: config.user, pass: config.pass ?? '' } } : {}),
      // The local capture server speaks plain SMTP on loopback.
      ...(config.host === '127.0.0.1' || config.host === 'localhost' ? { ignoreTLS: true } : {}),
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    const info = await this.transport.sendMail({ from: this.config.from, ...mail });
    this.logger.log(`mail "${mail.subject}" accepted for ${[mail.to].flat().length} recipient(s) (${info.messageId})`);
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
