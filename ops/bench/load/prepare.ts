/**
 * What the load run needs beside the demo firm: jobs with schedule lines still to bill (written as the
 * owner role in the firm's tenant transaction, cloned from the demo's first billed job, as the billing
 * bench does), and estimates that are not accepted yet, made and saved through the API.
 */
import { Pool, type PoolClient } from 'pg';
import type { Session } from './scenarios';

export async function inTenant<T>(pool: Pool, tenantId: string, work: (c: PoolClient) => Promise<T>): Promise<T> {
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

/** Titles of the jobs made here: the reconciliation finds their invoices by them. */
export const LOAD_JOB_TITLE = 'Load job %';

/**
 * `jobs` jobs, each with `linesPerJob` scheduled milestone lines (a small share of the contract each),
 * billing started. Answers the lines line-number first (every job's first line, then every job's
 * second), so drafts made one after another fall on different jobs, as different clients' would.
 */
export async function makeBillableLines(
  owner: Pool,
  firmId: string,
  jobs: number,
  linesPerJob: number,
): Promise<Array<{ jobId: string; lineId: string }>> {
  return inTenant(owner, firmId, async (c) => {
    const template = (
      await c.query<{ id: string; proposal_version_id: string }>(
        `select id, proposal_version_id from jobs where tenant_id = $1 and billing_started_at is not null
          order by billing_method = 'progress', created_at limit 1`,
        [firmId],
      )
    ).rows[0];
    if (!template) throw new Error('The demo firm has no billed job to copy.');
    await c.query(
      `insert into proposal_versions (tenant_id, estimate_id, version, status, snapshot, snapshot_hash, expires_on, created_at)
       select tenant_id, estimate_id, 200000 + g, 'superseded', snapshot, snapshot_hash, expires_on, created_at
         from proposal_versions, generate_series(1, $3::int) g where tenant_id = $1 and id = $2`,
      [firmId, template.proposal_version_id, jobs],
    );
    await c.query(
      `insert into jobs (tenant_id, estimate_id, proposal_version_id, client_id, site_id, title, accepted_variant_id, option_label,
                         currency, contract_sum, original_contract_sum, contract_tax, billing_method, billing_terms,
                         billing_started_at, start_date, finish_date)
       select j.tenant_id, j.estimate_id, v.id, j.client_id, j.site_id, 'Load job ' || (v.version - 200000), j.accepted_variant_id,
              j.option_label, j.currency, j.contract_sum, j.original_contract_sum, j.contract_tax, 'schedule',
              j.billing_terms, j.billing_started_at, j.start_date, j.finish_date
         from jobs j join proposal_versions v on v.tenant_id = j.tenant_id and v.estimate_id = j.estimate_id and v.version > 200000
        where j.tenant_id = $1 and j.id = $2`,
      [firmId, template.id],
    );
    await c.query(
      `insert into payment_schedule_lines (tenant_id, job_id, position, label, role, trigger, amount, status)
       select j.tenant_id, j.id, p, 'Stage ' || p, 'milestone', '{"kind": "date", "date": "2026-01-01"}',
              round(j.contract_sum / ($3::int * 4), 2), 'scheduled'
         from jobs j, generate_series(1, $3::int) p
        where j.tenant_id = $1 and j.title like $2`,
      [firmId, LOAD_JOB_TITLE, linesPerJob],
    );
    const { rows } = await c.query<{ job_id: string; id: string }>(
      `select l.job_id, l.id from payment_schedule_lines l join jobs j on j.tenant_id = l.tenant_id and j.id = l.job_id
        where l.tenant_id = $1 and j.title like $2 order by l.position, j.id`,
      [firmId, LOAD_JOB_TITLE],
    );
    return rows.map((r) => ({ jobId: r.job_id, lineId: r.id }));
  });
}

async function api<T>(base: string, as: Session, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { cookie: as.cookie, 'x-csrf-token': as.csrf, 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

interface EstimateView {
  id: string;
  siteId: string;
  price: string | null;
  inputs: { title: string; startDate: string } & Record<string, unknown>;
}

/**
 * `count` estimates on the demo house through the API, each saved with the inputs of a demo estimate
 * (so each is priced and can make proposal versions). Answers their ids.
 */
export async function makeLoadEstimates(base: string, as: Session, count: number): Promise<string[]> {
  const list = await api<{ items: Array<{ id: string; price: string | null }> }>(base, as, 'GET', '/api/estimates?limit=50');
  const priced = list.items.find((e) => e.price !== null);
  if (!priced) throw new Error('The demo firm has no priced estimate to copy.');
  const model = await api<EstimateView>(base, as, 'GET', `/api/estimates/${priced.id}`);
  const ids: string[] = [];
  for (let k = 1; k <= count; k++) {
    const title = `Load estimate ${k}`;
    const made = await api<EstimateView>(base, as, 'POST', '/api/estimates', {
      siteId: model.siteId,
      inquiryId: null,
      title,
      startDate: model.inputs.startDate,
    });
    await api<EstimateView>(base, as, 'PUT', `/api/estimates/${made.id}/inputs`, { ...model.inputs, title });
    ids.push(made.id);
  }
  return ids;
}
