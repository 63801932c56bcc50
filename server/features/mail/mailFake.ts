import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { z } from 'zod';
import type { Db } from '../../db/client';
import { mailMessages } from '../../db/schema';
import { TEAM_HEADER } from './mailer';

const MAX_BYTES = 5 * 1024 * 1024;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase())).filter(Boolean);
}

/**
 * A local SMTP server (loopback only) that keeps every message it receives in PostgreSQL,
 * so the Outbox page and the tests read real mail that went through real SMTP.
 */
export async function startMailFake(db: Db, { host = '127.0.0.1', port = 0 } = {}): Promise<{ port: number; close(): Promise<void> }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_BYTES,
    banner: 'Porelith local mail fake',
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', async () => {
        try {
          const raw = Buffer.concat(chunks).toString('utf8');
          const parsed = await simpleParser(raw);
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
          const teamHeader = parsed.headers.get(TEAM_HEADER.toLowerCase());
          const teamId = z.string().uuid().safeParse(teamHeader).success ? (teamHeader as string) : null;
          await db.insert(mailMessages).values({
            teamId,
            fromAddress: addresses(parsed.from)[0] ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            toAddresses: envelopeTo.length ? envelopeTo : addresses(parsed.to),
            subject: parsed.subject ?? '(no subject)',
            textBody: parsed.text ?? '',
            raw,
          });
          callback();
        } catch (err) {
          callback(err as Error);
        }
      });
    },
  });
  server.on('error', () => {}); // a broken client connection must not stop the fake
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return { port: actualPort, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
