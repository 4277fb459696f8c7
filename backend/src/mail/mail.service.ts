import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { AppConfig } from '../config/app-config.service';
import type { MailMessage } from './templates/mail-message';

/** Sends e-mail over SMTP (locally: the fake SMTP server, which keeps messages in the outbox folder). */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transporter: Transporter;

  constructor(private readonly config: AppConfig) {
    this.transporter = createTransport({
      host: config.get('SMTP_HOST'),
      port: config.get('SMTP_PORT'),
      secure: false,
      // The local server offers no TLS; a real relay would be configured with it.
      ignoreTLS: config.get('SMTP_HOST') === '127.0.0.1' || config.get('SMTP_HOST') === 'localhost',
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 10000,
    });
  }

  async send(to: string, message: MailMessage): Promise<void> {
    await this.transporter.sendMail({
      from: this.config.get('MAIL_FROM'),
      to,
      subject: message.subject,
      text: message.text,
      html: message.html,
    });
    this.logger.log(`sent "${message.subject}"`);
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
