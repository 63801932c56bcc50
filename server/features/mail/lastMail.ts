import { desc, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { mailMessages } from '../../db/schema';

export interface StoredMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: Date;
}

/**
 * The newest message the local mail fake stored for one address, or null. For whoever runs Porelith on
 * its own machine (the `mail:last` command); the web UI never shows personal mail to anyone else.
 * @example await newestMailTo(db, 'ada@example.org') // { subject: 'Reset your Porelith password', … }
 */
export async function newestMailTo(db: Db, address: string): Promise<StoredMail | null> {
  const [row] = await db
    .select()
    .from(mailMessages)
    .where(sql`${address.trim().toLowerCase()} = ANY(${mailMessages.toAddresses})`)
    .orderBy(desc(mailMessages.receivedAt))
    .limit(1);
  return row ? { from: row.fromAddress, to: row.toAddresses, subject: row.subject, text: row.textBody, receivedAt: row.receivedAt } : null;
}

/** The message as the command prints it. */
export function formatMail(mail: StoredMail): string {
  return `From: ${mail.from}\nTo: ${mail.to.join(', ')}\nDate: ${mail.receivedAt.toISOString()}\nSubject: ${mail.subject}\n\n${mail.text}`;
}
