import nodemailer from 'nodemailer';
import type { Env } from '../../env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** Shows the message to that team's admins in the Outbox; leave unset for anything personal (reset mail). */
  teamId?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export const TEAM_HEADER = 'X-Porelith-Team';

/** Real SMTP through nodemailer; locally that is the mail fake, elsewhere whatever SMTP_* names. */
export function createMailer(env: Pick<Env, 'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASS' | 'MAIL_FROM'>): Mailer {
  const transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? '' } : undefined,
    connectionTimeout: 10_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({
        from: env.MAIL_FROM,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        headers: mail.teamId ? { [TEAM_HEADER]: mail.teamId } : undefined,
      });
    },
    close: () => transport.close(),
  };
}
