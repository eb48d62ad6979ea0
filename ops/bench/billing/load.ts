/**
 * Bulk data for the billing bench, written as the owner role inside each firm's tenant transaction
 * (FORCE RLS applies to the owner too) with generate_series: the demo firm (seeded through the
 * services, so its jobs and invoices are real) gets 2,000 more jobs cloned from its first one and
 * 100,000 invoices over them (drafts, open, part paid, paid, void) spread over two years (ten minutes apart); 20 other
 * firms get 1,000 invoices each, so the list reads one firm among many.
 */
import { Pool, type PoolClient } from 'pg';

export const INVOICES = 100_000;
export const JOBS = 2_000;
const CLIENTS = 500;
const OTHER_FIRMS = 20;
const PER_OTHER_FIRM = 1_000;

async function inTenant<T>(pool: Pool, tenantId: string, work: (c: PoolClient) => Promise<T>): Promise<T> {
  const c = await pool.connect();
  try {
    await c.query('begin');
    await c.query(`select set_config('app.tenant_id', $1, true)`, [tenantId]);
    const out = await work(c);
    await c.query('commit');
    return out;
  } catch (error) {
    await c.query('rollback');
    throw error;
  } finally {
    c.release();
  }
}

/**
 * Status by age (r = 0 is the newest; ten minutes apart): the last few days hold the drafts and the
 * open invoices, the last three weeks a mix; older ones are mostly paid, with a few void and a few
 * still open (long overdue), as a firm's books look.
 */
const STATUS = `case when r < 600 and g % 10 = 0 then 'draft'
                     when r < 3000 then (array['issued', 'issued', 'part_paid', 'paid', 'paid', 'paid', 'paid', 'void'])[1 + g % 8]
                     when g % 50 = 1 then 'void' when g % 200 = 2 then 'issued' when g % 200 = 3 then 'part_paid'
                     else 'paid' end`;

/** Inserts `count` invoices over the firm's `bench_jobs` (temp table: id, client_id, n), numbered from `from`. */
async function insertInvoices(c: PoolClient, tenantId: string, count: number, jobs: number, from: number): Promise<void> {
  await c.query(
    `insert into invoices (tenant_id, job_id, client_id, kind, status, number, number_text, issued_on, due_on, currency,
                           subtotal, total, tax_included, amount_paid, amount_credited, lines, document, origin, created_at,
                           issued_at, voided_at, void_reason)
     select $1, j.id, j.client_id, (array['deposit', 'milestone', 'progress', 'final'])[1 + g % 4], s.status,
            case when s.status = 'draft' then null else $4 + g end,
            case when s.status = 'draft' then null else 'INV-' || lpad(($4 + g)::text, 5, '0') end,
            case when s.status = 'draft' then null else (t.at)::date end,
            case when s.status = 'draft' then null else (t.at)::date + 14 end,
            'USD', a.total, a.total, round(a.total * 0.0625, 2),
            case s.status when 'paid' then a.total when 'part_paid' then round(a.total / 2, 2) else 0 end,
            case s.status when 'void' then a.total else 0 end,
            jsonb_build_array(jsonb_build_object('label', 'Stage payment', 'amount', a.total::text)),
            case when s.status = 'draft' then null else d.document end,
            case when g % 3 = 0 then 'queue' else 'office' end,
            t.at, case when s.status = 'draft' then null else t.at end,
            case when s.status = 'void' then t.at + interval '1 day' end,
            case when s.status = 'void' then 'Billed twice' end
       from generate_series(1, $2::int) g
       join bench_jobs j on j.n = 1 + g % $3::int
       cross join lateral (select $2::int - g as r) age
       cross join lateral (select ${STATUS} as status) s
       cross join lateral (select (250 + (g * 37) % 9000)::numeric(14, 2) as total) a
       cross join lateral (select now() - ((($2::int - g) * 10) || ' minutes')::interval as at) t
       left join lateral (select document from invoices where tenant_id = $1 and document is not null limit 1) d on true`,
    [tenantId, count, jobs, from],
  );
}

/** Loads the bench data around the seeded demo firm. */
export async function loadBillingBench(ownerUrl: string, demoFirmId: string): Promise<void> {
  const owner = new Pool({ connectionString: ownerUrl, max: 2 });
  await inTenant(owner, demoFirmId, async (c) => {
    await c.query(
      `insert into clients (tenant_id, kind, name, email)
       select $1, 'homeowner', 'Bench Client ' || g, 'client' || g || '@bench.example' from generate_series(1, $2::int) g`,
      [demoFirmId, CLIENTS],
    );
    const template = (
      await c.query<{ id: string; proposal_version_id: string }>(
        `select id, proposal_version_id from jobs where tenant_id = $1 and billing_started_at is not null order by created_at limit 1`,
        [demoFirmId],
      )
    ).rows[0];
    await c.query(
      `insert into proposal_versions (tenant_id, estimate_id, version, status, snapshot, snapshot_hash, expires_on, created_at)
       select tenant_id, estimate_id, 1000 + g, 'superseded', snapshot, snapshot_hash, expires_on, created_at
         from proposal_versions, generate_series(1, $3::int) g where tenant_id = $1 and id = $2`,
      [demoFirmId, template.proposal_version_id, JOBS],
    );
    await c.query(
      `insert into jobs (tenant_id, estimate_id, proposal_version_id, client_id, site_id, title, accepted_variant_id, option_label,
                         currency, contract_sum, original_contract_sum, contract_tax, billing_method, billing_terms,
                         billing_started_at, start_date, finish_date, created_at)
       select j.tenant_id, j.estimate_id, v.id, c.id, j.site_id, 'Bench job ' || (v.version - 1000), j.accepted_variant_id,
              j.option_label, j.currency, j.contract_sum, j.original_contract_sum, j.contract_tax, j.billing_method,
              j.billing_terms, j.billing_started_at, j.start_date, j.finish_date, j.created_at
         from jobs j
         join proposal_versions v on v.tenant_id = j.tenant_id and v.estimate_id = j.estimate_id and v.version > 1000
         join (select id, row_number() over (order by id) as n from clients where tenant_id = $1 and name like 'Bench Client %') c
           on c.n = 1 + (v.version - 1000) % $3::int
        where j.tenant_id = $1 and j.id = $2`,
      [demoFirmId, template.id, CLIENTS],
    );
    await c.query(
      `create temp table bench_jobs on commit drop as
       select id, client_id, row_number() over (order by id) as n from jobs where tenant_id = $1 and title like 'Bench job %'`,
      [demoFirmId],
    );
    // Numbers continue the firm's series; the counter moves past them, so issuing goes on from there.
    const from = Number(
      (await c.query<{ n: string }>(`select coalesce(max(number), 0) as n from invoices where tenant_id = $1`, [demoFirmId])).rows[0].n,
    );
    await insertInvoices(c, demoFirmId, INVOICES, JOBS, from);
    await c.query(
      `insert into document_counters (tenant_id, series, next_no) values ($1, 'invoice', $2)
       on conflict (tenant_id, series) do update set next_no = excluded.next_no`,
      [demoFirmId, from + INVOICES + 1],
    );
  });
  // Other firms' rows only need to be there: they borrow some of the demo firm's jobs (foreign keys do not see tenants).
  const borrowed = await inTenant(owner, demoFirmId, (c) =>
    c.query<{ id: string; client_id: string }>(
      `select id, client_id from jobs where tenant_id = $1 and title like 'Bench job %' limit 50`,
      [demoFirmId],
    ),
  );
  for (let f = 0; f < OTHER_FIRMS; f++) {
    const id = (await owner.query<{ id: string }>(`select gen_random_uuid() as id`)).rows[0].id;
    await inTenant(owner, id, async (c) => {
      await c.query(`insert into firms (id, name, slug) values ($1, $2, $3)`, [
        id,
        `Bench Firm ${f}`,
        `bench-billing-${f}-${id.slice(0, 8)}`,
      ]);
      await c.query(
        `create temp table bench_jobs on commit drop as
         select id, client_id, n from unnest($1::uuid[], $2::uuid[]) with ordinality as t(id, client_id, n)`,
        [borrowed.rows.map((r) => r.id), borrowed.rows.map((r) => r.client_id)],
      );
      await insertInvoices(c, id, PER_OTHER_FIRM, borrowed.rows.length, 0);
    });
  }
  await owner.query('analyze');
  await owner.end();
}

/**
 * Drafts to issue: `count` more jobs cloned from the demo firm's first billed job, each with one
 * stage-payment line ready to bill and its draft invoice (a tenth of the contract), so every issue
 * in the bench is a first issue on its own job, as the office's day has them. Answers the drafts' ids.
 */
export async function makeIssueDrafts(ownerUrl: string, demoFirmId: string, count: number): Promise<string[]> {
  const owner = new Pool({ connectionString: ownerUrl, max: 1 });
  const ids = await inTenant(owner, demoFirmId, async (c) => {
    const template = (
      await c.query<{ id: string; proposal_version_id: string }>(
        `select id, proposal_version_id from jobs where tenant_id = $1 and billing_started_at is not null order by created_at limit 1`,
        [demoFirmId],
      )
    ).rows[0];
    await c.query(
      `insert into proposal_versions (tenant_id, estimate_id, version, status, snapshot, snapshot_hash, expires_on, created_at)
       select tenant_id, estimate_id, 100000 + g, 'superseded', snapshot, snapshot_hash, expires_on, created_at
         from proposal_versions, generate_series(1, $3::int) g where tenant_id = $1 and id = $2`,
      [demoFirmId, template.proposal_version_id, count],
    );
    await c.query(
      `insert into jobs (tenant_id, estimate_id, proposal_version_id, client_id, site_id, title, accepted_variant_id, option_label,
                         currency, contract_sum, original_contract_sum, contract_tax, billing_method, billing_terms,
                         billing_started_at, start_date, finish_date)
       select j.tenant_id, j.estimate_id, v.id, j.client_id, j.site_id, 'Bench issue job ' || (v.version - 100000), j.accepted_variant_id,
              j.option_label, j.currency, j.contract_sum, j.original_contract_sum, j.contract_tax, j.billing_method,
              j.billing_terms, j.billing_started_at, j.start_date, j.finish_date
         from jobs j join proposal_versions v on v.tenant_id = j.tenant_id and v.estimate_id = j.estimate_id and v.version > 100000
        where j.tenant_id = $1 and j.id = $2`,
      [demoFirmId, template.id],
    );
    await c.query(
      `insert into payment_schedule_lines (tenant_id, job_id, position, label, role, trigger, amount, status)
       select tenant_id, id, 1, 'Stage payment', 'milestone', '{"kind": "date", "date": "2026-01-01"}', round(contract_sum / 10, 2), 'ready'
         from jobs where tenant_id = $1 and title like 'Bench issue job %'`,
      [demoFirmId],
    );
    const { rows } = await c.query<{ id: string }>(
      `insert into invoices (tenant_id, job_id, client_id, kind, schedule_line_id, currency, subtotal, total, lines, origin)
       select j.tenant_id, j.id, j.client_id, 'milestone', l.id, j.currency, l.amount, l.amount,
              jsonb_build_array(jsonb_build_object('label', l.label, 'amount', l.amount::text)), 'queue'
         from jobs j join payment_schedule_lines l on l.tenant_id = j.tenant_id and l.job_id = j.id
        where j.tenant_id = $1 and j.title like 'Bench issue job %'
       returning id`,
      [demoFirmId],
    );
    return rows.map((r) => r.id);
  });
  await owner.query('analyze');
  await owner.end();
  return ids;
}
