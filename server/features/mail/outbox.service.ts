import { sql } from 'drizzle-orm';
import type { OutboxMessage } from '../../../shared/schemas/auth';
import type { Db } from '../../db/client';

/**
 * Messages tagged with the team (the invitations it sent), newest first. Never mail merely addressed
 * to its members or invitees: password-reset mail carries no team, and showing it to admins would let
 * them reset and take over any member's account.
 */
export async function listTeamOutbox(db: Db, teamId: string, limit = 200): Promise<OutboxMessage[]> {
  const result = await db.execute<{
    id: string;
    from_address: string;
    to_addresses: string[];
    subject: string;
    text_body: string;
    received_at: Date;
  }>(sql`
    SELECT m.id, m.from_address, m.to_addresses, m.subject, m.text_body, m.received_at
    FROM mail_messages m
    WHERE m.team_id = ${teamId}
    ORDER BY m.received_at DESC
    LIMIT ${limit}`);
  return result.rows.map((r) => ({
    id: r.id,
    from: r.from_address,
    to: r.to_addresses.join(', '),
    subject: r.subject,
    text: r.text_body,
    receivedAt: new Date(r.received_at).toISOString(),
  }));
}
