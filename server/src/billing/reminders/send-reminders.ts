import type { TenantTx } from '@layerbook/db';
import { remindersDue } from '@layerbook/domain';
import { recordAudit } from '../../audit/record';
import type { Config } from '../../config';
import { SYSTEM_ACTOR } from '../../http/actor';
import type { JobQueue } from '../../queue/job-queue';
import { enqueueInvoiceMail } from '../invoice-mail';
import { loadBillingSettings } from '../settings';

interface OpenInvoice {
  id: string;
  job_id: string;
  due_on: string;
  sent: string[];
}

/**
 * The firm's reminders for `today`: for each issued or part-paid invoice with a due date, the one
 * step of the firm's current cadence that is due (remindersDue), never a step already sent for it.
 * The row in invoice_reminders is the claim: only the run whose insert lands sends the e-mail, so
 * two runs of one day (two workers, a retry) send it once, also after the cadence changed. Paid
 * and void invoices get none, also one voided or paid while the run goes. `now` dates the e-mail's
 * sign-in link. Returns the steps sent. `mail: false` records the steps without e-mails (the demo
 * firm's history, which is made up and mails no one).
 */
export async function sendDueReminders(
  tx: TenantTx,
  queue: JobQueue,
  config: Config,
  today: string,
  now: Date,
  { mail = true }: { readonly mail?: boolean } = {},
): Promise<Array<{ invoiceId: string; step: string }>> {
  const { settings } = await loadBillingSettings(tx);
  const { isOn, daysBefore, onDueDate, everyDaysAfter, maxAfter } = settings.reminders;
  if (!isOn) return [];
  const { rows } = await tx.client.query<OpenInvoice>(
    `select i.id, i.job_id, i.due_on::text as due_on,
            coalesce(array_agg(r.step) filter (where r.step is not null), '{}') as sent
       from invoices i left join invoice_reminders r on r.tenant_id = i.tenant_id and r.invoice_id = i.id
      where i.tenant_id = $1 and i.status in ('issued', 'part_paid') and i.due_on is not null
      group by i.id order by i.due_on, i.id`,
    [tx.tenantId],
  );
  const sent: Array<{ invoiceId: string; step: string }> = [];
  for (const invoice of rows) {
    const due = remindersDue({
      cadence: { daysBefore, onDueDate, everyDaysAfter, maxAfter },
      dueOn: invoice.due_on,
      today,
      sent: invoice.sent.map((step) => ({ step })),
    });
    if (!due) continue;
    // Still open once a void or a payment being written on it has committed (the share lock waits for
    // theirs, and the row is read again): the list above may be older than they are.
    const open = await tx.client.query(
      `select 1 from invoices where tenant_id = $1 and id = $2 and status in ('issued', 'part_paid') for share`,
      [tx.tenantId, invoice.id],
    );
    if (!open.rowCount) continue;
    const claimed = await tx.client.query(
      `insert into invoice_reminders (tenant_id, invoice_id, step, sent_on) values ($1, $2, $3, $4)
       on conflict (tenant_id, invoice_id, step) do nothing returning id`,
      [tx.tenantId, invoice.id, due.step, today],
    );
    if (!claimed.rowCount) continue;
    if (mail) await enqueueInvoiceMail(tx, queue, config, invoice.id, { kind: 'reminder', step: due.step }, now);
    await recordAudit(tx, {
      actorUserId: SYSTEM_ACTOR.userId,
      actorKind: SYSTEM_ACTOR.kind,
      action: 'invoice.reminded',
      entity: 'invoice',
      entityId: invoice.id,
      data: { step: due.step, on: today, dueOn: invoice.due_on, skipped: due.skipped, jobId: invoice.job_id },
    });
    sent.push({ invoiceId: invoice.id, step: due.step });
  }
  return sent;
}
