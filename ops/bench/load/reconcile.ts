/**
 * After the run, the database against the answers: every write that was answered 2xx is there once,
 * nothing is there that was not answered, and the invoice numbers taken in the run follow each other
 * without a gap or a repeat. Read as the owner role inside the firm's tenant transaction.
 */
import type { Pool } from 'pg';
import { inTenant, LOAD_JOB_TITLE } from './prepare';
import type { Recorder } from './stats';

export interface Counts {
  inquiries: number;
  drafts: number;
  issued: number;
  maxNumber: number;
  estimateSaves: number;
  proposalVersions: number;
  outbox: number;
}

export async function countRows(owner: Pool, firmId: string, estimateIds: readonly string[]): Promise<Counts> {
  return inTenant(owner, firmId, async (c) => {
    const one = async (sql: string, values: unknown[] = [firmId]) => Number((await c.query<{ n: string }>(sql, values)).rows[0].n);
    return {
      inquiries: await one(`select count(*) as n from inquiries where tenant_id = $1`),
      drafts: await one(
        `select count(*) as n from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id where i.tenant_id = $1 and j.title like $2`,
        [firmId, LOAD_JOB_TITLE],
      ),
      issued: await one(`select count(*) as n from invoices where tenant_id = $1 and number is not null`),
      maxNumber: await one(`select coalesce(max(number), 0) as n from invoices where tenant_id = $1`),
      estimateSaves: await one(
        `select count(*) as n from audit_log where tenant_id = $1 and action = 'estimate.saved' and entity_id = any($2::uuid[])`,
        [firmId, estimateIds],
      ),
      proposalVersions: await one(`select count(*) as n from proposal_versions where tenant_id = $1 and estimate_id = any($2::uuid[])`, [
        firmId,
        estimateIds,
      ]),
      outbox: await one(`select count(*) as n from mail_outbox where tenant_id = $1`),
    };
  });
}

interface Line {
  readonly what: string;
  readonly answered: number;
  readonly rows: number;
  readonly problems: string[];
}

const missingExtra = (answered: Iterable<string>, stored: Iterable<string>): string[] => {
  const a = new Set(answered);
  const s = new Set(stored);
  const missing = [...a].filter((x) => !s.has(x));
  const extra = [...s].filter((x) => !a.has(x));
  return [
    ...(missing.length ? [`${missing.length} answered 2xx but not stored (e.g. ${missing.slice(0, 3).join(', ')})`] : []),
    ...(extra.length ? [`${extra.length} stored but never answered 2xx (e.g. ${extra.slice(0, 3).join(', ')})`] : []),
  ];
};

/** Checks the rows against the recorder; prints the table and answers whether everything reconciles. */
export async function reconcile(
  owner: Pool,
  firmId: string,
  estimateIds: readonly string[],
  before: Counts,
  rec: Recorder,
): Promise<boolean> {
  const after = await countRows(owner, firmId, estimateIds);
  const lines: Line[] = await inTenant(owner, firmId, async (c) => {
    const out: Line[] = [];

    // Inquiries: one per form sent and answered 201, found by its unique e-mail, no duplicates.
    const forms = await c.query<{ email: string; n: string }>(
      `select email, count(*) as n from inquiries where tenant_id = $1 and email like '%@load.example' group by email`,
      [firmId],
    );
    const dup = forms.rows.filter((r) => Number(r.n) > 1);
    out.push({
      what: 'inquiries filed by the public form',
      answered: rec.formEmails.length,
      rows: after.inquiries - before.inquiries,
      problems: [
        ...missingExtra(
          rec.formEmails,
          forms.rows.map((r) => r.email),
        ),
        ...(dup.length ? [`${dup.length} e-mails filed more than once`] : []),
      ],
    });

    // Mail: each inquiry queues the visitor's acknowledgement and a notice to each active owner and office member.
    const staff = Number(
      (
        await c.query<{ n: string }>(
          `select count(*) as n from memberships where tenant_id = $1 and status = 'active' and role in ('owner', 'office')`,
          [firmId],
        )
      ).rows[0].n,
    );
    out.push({
      what: `e-mails queued (1 + ${staff} per inquiry)`,
      answered: rec.formEmails.length * (1 + staff),
      rows: after.outbox - before.outbox,
      problems: [],
    });

    // Drafts: one per draft answered 201, on the run's jobs.
    const drafts = await c.query<{ id: string }>(
      `select i.id from invoices i join jobs j on j.tenant_id = i.tenant_id and j.id = i.job_id where i.tenant_id = $1 and j.title like $2`,
      [firmId, LOAD_JOB_TITLE],
    );
    out.push({
      what: 'invoice drafts on the run’s jobs',
      answered: rec.drafts.length,
      rows: after.drafts - before.drafts,
      problems: missingExtra(
        rec.drafts,
        drafts.rows.map((r) => r.id),
      ),
    });

    // Issued: exactly the invoices answered 200, each with the number its answer printed; the numbers
    // taken in the run continue the firm's series with no gap and no repeat, and the counter is past them.
    const issued = await c.query<{ id: string; number: string; number_text: string }>(
      `select id, number, number_text from invoices where tenant_id = $1 and number > $2 order by number`,
      [firmId, before.maxNumber],
    );
    const numbers = issued.rows.map((r) => Number(r.number));
    const problems = missingExtra(
      rec.issued.keys(),
      issued.rows.map((r) => r.id),
    );
    const wrongText = issued.rows.filter((r) => rec.issued.has(r.id) && rec.issued.get(r.id) !== r.number_text);
    if (wrongText.length) problems.push(`${wrongText.length} answers printed another number than stored`);
    const gaps = numbers.filter((n, i) => n !== before.maxNumber + i + 1);
    if (gaps.length) problems.push(`numbers not consecutive from ${before.maxNumber + 1} (first off: ${gaps[0]})`);
    if (new Set(numbers).size !== numbers.length) problems.push('a number is used twice');
    const counter = await c.query<{ next_no: string }>(
      `select next_no from document_counters where tenant_id = $1 and series = 'invoice'`,
      [firmId],
    );
    if (Number(counter.rows[0]?.next_no) !== after.maxNumber + 1)
      problems.push(`the counter stands at ${counter.rows[0]?.next_no}, not ${after.maxNumber + 1}`);
    out.push({
      what: `invoices issued (numbers ${before.maxNumber + 1}–${after.maxNumber})`,
      answered: rec.issued.size,
      rows: after.issued - before.issued,
      problems,
    });

    // Estimate saves: one audit row each.
    out.push({
      what: 'estimate saves (audit rows)',
      answered: rec.estimateSaves,
      rows: after.estimateSaves - before.estimateSaves,
      problems: [],
    });

    // Proposal versions: exactly the ones answered 201; per estimate numbered 1..n and one draft left.
    const versions = await c.query<{ id: string; estimate_id: string; version: number; status: string }>(
      `select id, estimate_id, version, status from proposal_versions where tenant_id = $1 and estimate_id = any($2::uuid[]) order by estimate_id, version`,
      [firmId, estimateIds],
    );
    const vProblems = missingExtra(
      rec.proposalVersions,
      versions.rows.map((r) => r.id),
    );
    for (const id of estimateIds) {
      const mine = versions.rows.filter((r) => r.estimate_id === id);
      if (mine.some((r, i) => r.version !== i + 1)) vProblems.push(`estimate ${id}: versions not 1..${mine.length}`);
      const drafts = mine.filter((r) => r.status === 'draft').length;
      if (mine.length && drafts !== 1) vProblems.push(`estimate ${id}: ${drafts} drafts`);
    }
    out.push({
      what: 'proposal versions of the run’s estimates',
      answered: rec.proposalVersions.length,
      rows: after.proposalVersions - before.proposalVersions,
      problems: vProblems,
    });
    return out;
  });

  console.log(`\n  ${'reconciliation'.padEnd(44)} ${'2xx answers'.padStart(11)} ${'new rows'.padStart(9)}  result`);
  let ok = true;
  for (const l of lines) {
    const good = l.answered === l.rows && l.problems.length === 0;
    ok &&= good;
    console.log(`  ${l.what.padEnd(44)} ${String(l.answered).padStart(11)} ${String(l.rows).padStart(9)}  ${good ? 'ok' : 'MISMATCH'}`);
    for (const p of l.problems) console.log(`      ${p}`);
  }
  return ok;
}
