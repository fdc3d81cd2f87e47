import nodemailer from 'nodemailer';
import type { MailContent } from './mail-layout';

export interface Mailer {
  send(to: string, content: MailContent): Promise<void>;
  close(): void;
}

/** Sends through SMTP: a real server from SMTP_URL, or the in-process fake one on loopback. */
export function createMailer(options: { smtpUrl?: string; localPort?: number; from: string }): Mailer {
  const transport = options.smtpUrl
    ? nodemailer.createTransport(options.smtpUrl)
    : nodemailer.createTransport({ host: '127.0.0.1', port: options.localPort, secure: false, ignoreTLS: true });
  return {
    async send(to, content) {
      await transport.sendMail({ from: options.from, to, subject: content.subject, text: content.text, html: content.html });
    },
    close: () => transport.close(),
  };
}
