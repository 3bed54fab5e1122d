import { Injectable, OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { Env } from '../config/env.validation';

/** One message to send. */
export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
}

/** Sends e-mail through SMTP (the local sink in development and tests). */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly transport: Transporter;
  private readonly from: string;

  constructor(env: Env) {
    this.from = env.MAIL_FROM;
    this.transport = createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      ignoreTLS: env.SMTP_IGNORE_TLS,
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined,
      connectionTimeout: env.HEALTH_TIMEOUT_MS,
      greetingTimeout: env.HEALTH_TIMEOUT_MS,
      socketTimeout: 10_000,
    });
  }

  /** Sends a message; returns the SMTP message id. */
  async send(mail: OutgoingMail): Promise<string> {
    const info = await this.transport.sendMail({ from: this.from, ...mail });
    return info.messageId;
  }

  /** Resolves when the SMTP server greets us and accepts a session. */
  async ping(): Promise<void> {
    await this.transport.verify();
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
