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

const LOOPBACK = new Set(['127.0.0.1', 'localhost', '::1', '[::1]']);

/**
 * Whether mail goes to the local mail fake (kept in this machine's database) rather than out: `npm start`
 * runs the fake when SMTP_HOST is unset, which the parsed environment sees as a loopback host without login.
 * @example isLocalMailFake({ SMTP_HOST: '127.0.0.1', SMTP_USER: undefined }) // true
 */
export function isLocalMailFake(env: Pick<Env, 'SMTP_HOST' | 'SMTP_USER'>): boolean {
  return LOOPBACK.has(env.SMTP_HOST.trim().toLowerCase()) && !env.SMTP_USER;
}
