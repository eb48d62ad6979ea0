import { randomUUID } from 'node:crypto';
import type { Tx } from '@layerbook/db';
import type { JobQueue } from '../queue/job-queue';
import { QUEUES } from '../queue/queues';
import type { RenderedMail } from './templates';

export interface OutgoingMail extends RenderedMail {
  /** Unique per reason to send (e.g. `invitation:<id>`): the same purpose is never sent twice. */
  readonly purposeKey: string;
  readonly to: string;
  readonly tenantId: string;
  /**
   * 'firm' for mail to the firm's clients: it comes from the firm's name (at our sending address)
   * and replies go to the firm (its first owner's e-mail). Staff mail comes from Layerbook.
   */
  readonly sender?: 'firm';
}

/** The firm as a sender: its name, and the address its clients' replies go to (the first owner's). */
export async function firmSender(tx: Tx, tenantId: string): Promise<{ fromName: string; replyTo: string | null }> {
  const { rows } = await tx.client.query<{ name: string; reply_to: string | null }>(
    `select f.name,
            (select u.email from memberships m join users u on u.id = m.user_id
              where m.tenant_id = f.id and m.role = 'owner' and m.status = 'active'
              order by m.created_at, u.id limit 1) as reply_to
       from firms f where f.id = $1`,
    [tenantId],
  );
  const row = rows[0];
  if (!row) throw new Error(`firm ${tenantId} not visible when writing its mail`);
  return { fromName: row.name, replyTo: row.reply_to };
}

/** Writes the outbox row and enqueues its send job in the caller's transaction. */
export async function enqueueMail(tx: Tx, queue: JobQueue, mail: OutgoingMail): Promise<void> {
  const id = randomUUID();
  const from = mail.sender === 'firm' ? await firmSender(tx, mail.tenantId) : { fromName: null, replyTo: null };
  const inserted = await tx.client.query(
    `insert into mail_outbox (id, tenant_id, purpose_key, to_address, subject, html, text, from_name, reply_to)
     values ($1, $2, $3, $4, $5, $6, $7, $8, $9) on conflict (purpose_key) do nothing`,
    [id, mail.tenantId, mail.purposeKey, mail.to, mail.subject, mail.html, mail.text, from.fromName, from.replyTo],
  );
  if (inserted.rowCount === 1) await queue.send(QUEUES.mailSend, { outboxId: id }, tx);
}
