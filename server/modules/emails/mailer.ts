import nodemailer from 'nodemailer';
import type { Env } from '../../config/env';

/** A file sent with an e-mail (e.g. the .ics of a delivery window). */
export interface MailAttachment {
  filename: string;
  contentType: string;
  /** UTF-8 text content. */
  content: string;
}

/** A rendered e-mail, ready to hand to SMTP. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: MailAttachment[];
}

/** Sends rendered e-mails; answers the provider's message id. */
export interface Mailer {
  send(message: MailMessage): Promise<{ messageId: string }>;
  close(): void;
}

export type MailerConfig = Pick<
  Env,
  'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASSWORD' | 'MAIL_FROM'
>;

/** An SMTP mailer over nodemailer, with short timeouts so a dead server fails the job fast. */
export function createSmtpMailer(config: MailerConfig): Mailer {
  const transport = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE === 'true',
    auth: config.SMTP_USER
      ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD ?? '' }
      : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    async send(message) {
      const info = await transport.sendMail({
        from: config.MAIL_FROM,
        to: message.to,
        subject: message.subject,
        text: message.text,
        html: message.html,
        attachments: message.attachments?.map((a) => ({
          filename: a.filename,
          contentType: a.contentType,
          content: a.content,
        })),
      });
      return { messageId: info.messageId };
    },
    close: () => transport.close(),
  };
}
