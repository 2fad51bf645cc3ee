import nodemailer from 'nodemailer';
import type { Config } from '../config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  /** Opens a connection to the relay and says whether it answered. */
  check(): Promise<boolean>;
}

/** Sends through the configured SMTP relay (the local sink on a developer's machine). */
export function createMailer(config: Config): Mailer {
  const transport = nodemailer.createTransport(config.SMTP_URL);
  return {
    async send(mail) {
      await transport.sendMail({ from: config.MAIL_FROM, ...mail });
    },
    check: () => transport.verify(),
  };
}
