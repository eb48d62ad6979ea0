import type { Pool } from 'pg';
import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { MailSendJob } from '../queue/queues';

/** The configured sending address without its display name ("Layerbook <a@b>" → "a@b"). */
export function sendingAddress(configured: string): string {
  return /<([^<>]+)>\s*$/.exec(configured)?.[1]?.trim() ?? configured.trim();
}

/** From: the configured sender, or a firm's name at our sending address (we never send as the firm's own domain). */
export function fromHeader(configured: string, fromName: string | null): string | { name: string; address: string } {
  return fromName ? { name: fromName, address: sendingAddress(configured) } : configured;
}

/**
 * Sends one outbox row. Safe to run twice: the row is locked, and a row already sent is skipped.
 * The Message-ID is stable per row, so a resend after a crash can be recognised downstream.
 */
export async function sendOutboxMail(pool: Pool, transport: Transporter, from: string, job: MailSendJob, logger: Logger): Promise<void> {
  const client = await pool.connect();
  let broken = false;
  try {
    await client.query('begin');
    const { rows } = await client.query(
      `select id, to_address, subject, html, text, status, from_name, reply_to from mail_outbox where id = $1 for update`,
      [job.outboxId],
    );
    const row = rows[0] as
      | {
          id: string;
          to_address: string;
          subject: string;
          html: string;
          text: string;
          status: string;
          from_name: string | null;
          reply_to: string | null;
        }
      | undefined;
    if (!row || row.status === 'sent') {
      await client.query('commit');
      return;
    }
    await transport.sendMail({
      from: fromHeader(from, row.from_name),
      ...(row.reply_to ? { replyTo: row.reply_to } : {}),
      to: row.to_address,
      subject: row.subject,
      html: row.html,
      text: row.text,
      messageId: `<${row.id}@layerbook.local>`,
    });
    await client.query(`update mail_outbox set status = 'sent', sent_at = now(), attempts = attempts + 1 where id = $1`, [row.id]);
    await client.query('commit');
    logger.info({ outboxId: row.id }, 'mail sent');
  } catch (error) {
    // On the same connection: asking the pool for another while this one is held would deadlock once
    // every handler fails at once (four sends, four connections, the SMTP server down).
    const kept = await client
      .query('rollback')
      .then(() =>
        client.query(`update mail_outbox set attempts = attempts + 1, last_error = $2 where id = $1`, [job.outboxId, String(error)]),
      )
      .then(
        () => true,
        () => false,
      );
    broken = !kept;
    throw error;
  } finally {
    // A connection that failed (dropped by the database) is thrown away, not put back.
    client.release(broken);
  }
}
