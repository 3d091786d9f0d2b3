import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config/config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Outgoing mail through SMTP (maildev locally). `send` rejects when the mail server is down. */
export class Mailer {
  private readonly transport: Transporter;

  constructor(private readonly config: Config['mail']) {
    this.transport = nodemailer.createTransport({
      host: config.host,
      port: config.port,
      secure: false,
      ignoreTLS: true,
      pool: true,
      maxConnections: 2,
      connectionTimeout: 3000,
      greetingTimeout: 3000,
      socketTimeout: 10000,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.from, ...mail });
  }

  /** True when the mail server answers. */
  async isReachable(): Promise<boolean> {
    try {
      await this.transport.verify();
      return true;
    } catch {
      return false;
    }
  }

  close(): void {
    this.transport.close();
  }
}
