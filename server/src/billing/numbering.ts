import type { SqlQuery, TenantTx } from '@layerbook/db';
import { documentNumber } from '@layerbook/domain';

/** Digits a document number is padded to ("INV-0007"). */
const NUMBER_WIDTH = 4;

export type DocumentSeries = 'invoice' | 'credit_note' | 'receipt';

/**
 * The next number of one of the firm's document series (1, 2, 3 …), taken in the caller's
 * transaction: the counter row stays locked until it commits, so concurrent issuers wait their
 * turn, and a rollback gives the number back — no gap, no duplicate (a sequence would leave gaps).
 */
export async function nextDocumentNumber(tx: TenantTx, series: DocumentSeries): Promise<number> {
  const { rows } = await tx.client.query<{ n: number }>(
    `insert into document_counters (tenant_id, series, next_no) values ($1, $2, 2)
     on conflict (tenant_id, series) do update set next_no = document_counters.next_no + 1
     returning next_no - 1 as n`,
    [tx.tenantId, series],
  );
  return rows[0].n;
}

/**
 * documentNumber() in SQL, for the number taken in the same statement: `head` is the prefix as
 * documentNumber joins it (documentNumber(prefix, 1, 1) without its digit), `n` the number, `width`
 * the padding — three SQL expressions. numbering.spec.ts checks the two agree.
 */
export const numberTextSql = (head: string, n: string, width: string) =>
  `${head} || lpad(${n}::text, greatest(${width}, length(${n}::text)), '0')`;

/** The head numberTextSql takes for a prefix. */
export const numberHead = (prefix: string) => documentNumber(prefix, 1, 1).slice(0, -1);

/** What issuing sets in the same statement as the number: the columns the firm's kept cash figures read. */
export interface IssuedState {
  readonly status: 'issued' | 'paid';
  readonly dueOn: string;
  readonly total: string;
}

/** The audit entry issuing writes with the number. */
const ISSUED = { action: 'invoice.issued' } as const;

/** Who issues, for the audit entry written in the same statement. */
export interface IssuedBy {
  readonly actorUserId: string | null;
  readonly actorKind: 'staff' | 'client' | 'system';
}

/**
 * Issuing's last write: takes the next invoice number, stamps it on the invoice with its issued
 * state (the columns the firm's kept cash figures read, so their triggers lock those rows only
 * now) and writes the "invoice.issued" audit entry, all in one statement, so the counter row —
 * which every issuer of the firm waits on until commit — is held as briefly as possible: send it
 * last, with COMMIT in the same round trip where the caller can (issue.ts). Answers `n` and `text`.
 * The text is made in SQL (numberTextSql).
 */
export function invoiceNumberQuery(tenantId: string, invoiceId: string, prefix: string, state: IssuedState, by: IssuedBy): SqlQuery {
  return {
    name: 'invoice_take_number',
    text: `with counter as (
       insert into document_counters (tenant_id, series, next_no) values ($1, 'invoice', 2)
       on conflict (tenant_id, series) do update set next_no = document_counters.next_no + 1
       returning next_no - 1 as n),
     numbered as (
       update invoices i set number = counter.n, number_text = ${numberTextSql('$3::text', 'counter.n', '$4::int')},
              status = $5, due_on = $6, total = $7
         from counter where i.tenant_id = $1 and i.id = $2
       returning counter.n as n, i.number_text as text, i.issued_on, i.due_on, i.total),
     audit as (
       insert into audit_log (tenant_id, actor_user_id, actor_kind, action, entity, entity_id, data)
       select $1, $8, $9, $10, 'invoice', $2,
              jsonb_build_object('number', text, 'issuedOn', issued_on::text, 'dueOn', due_on::text, 'total', total::text)
         from numbered)
     select n, text from numbered`,
    values: [
      tenantId,
      invoiceId,
      numberHead(prefix),
      NUMBER_WIDTH,
      state.status,
      state.dueOn,
      state.total,
      by.actorUserId,
      by.actorKind,
      ISSUED.action,
    ],
  };
}
