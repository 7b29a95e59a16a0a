import nodemailer from 'nodemailer';
import type Mail from 'nodemailer/lib/mailer';
import type { Config } from '../config.ts';

export type OutgoingMail = Pick<
  Mail.Options,
  'to' | 'subject' | 'text' | 'html' | 'headers' | 'attachments' | 'icalEvent' | 'messageId'
>;

export interface Mailer {
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  ping(): Promise<void>;
  close(): void;
}

export function createMailer(config: Config): Mailer {
  const transport = nodemailer.createTransport(config.SMTP_URL, {
    from: config.MAIL_FROM,
  });
  return {
    async send(mail) {
      const info = await transport.sendMail(mail);
      return { messageId: info.messageId };
    },
    async ping() {
      await transport.verify();
    },
    close() {
      transport.close();
    },
  };
}
