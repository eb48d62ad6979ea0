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
}

/** Writes the outbox row and enqueues its send job in the caller's transaction. */
export async function enqueueMail(tx: Tx, queue: JobQueue, mail: OutgoingMail): Promise<void> {
  const id = randomUUID();
  const inserted = await tx.client.query(
    `insert into mail_outbox (id, tenant_id, purpose_key, to_address, subject, html, text)
     values ($1, $2, $3, $4, $5, $6, $7) on conflict (purpose_key) do nothing`,
    [id, mail.tenantId, mail.purposeKey, mail.to, mail.subject, mail.html, mail.text],
  );
  if (inserted.rowCount === 1) await queue.send(QUEUES.mailSend, { outboxId: id }, tx);
}
