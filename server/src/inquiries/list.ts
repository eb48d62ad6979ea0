import type { BoardColumn, InquiryListQuery, InquiryStage, InquirySummary, ItemList, KeysetPage, TodayView } from '@layerbook/contracts';
import { INQUIRY_STAGES, STAGE_LABELS, UNASSIGNED } from '@layerbook/contracts';
import { weightedPipeline } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { type SqlQuery, statementName, type TenantTx } from '@layerbook/db';
import { phoneDigitsSql, phoneSearchDigits } from '../clients/phone';
import type { FirmClock } from './clock';
import { decodeCursor, encodeCursor } from './cursor';
import { SUMMARY_COLUMNS, SUMMARY_FROM, SummaryRow, toSummary } from './rows';
import { stageLikelihoods } from './stage-settings';

/**
 * Each sort is a keyset over (sort key, id): the cursor carries the last row's key, so a deep page
 * costs the same as the first (no OFFSET). `newest`/`oldest` ride the (tenant_id, created_at, id) index.
 */
const SORTS = {
  newest: { key: 'i.created_at', cast: 'timestamptz', dir: 'desc', text: 'created_at_text' },
  oldest: { key: 'i.created_at', cast: 'timestamptz', dir: 'asc', text: 'created_at_text' },
  value: { key: 'coalesce(i.estimated_value, -1)', cast: 'numeric', dir: 'desc', text: 'sort_value' },
  follow_up: { key: "coalesce(i.next_follow_up, '9999-12-31'::date)", cast: 'date', dir: 'asc', text: 'sort_value' },
} as const;

type ListRow = SummaryRow & { sort_value: string };

export function buildListQuery(tenantId: string, q: InquiryListQuery): SqlQuery & { values: unknown[] } {
  const sort = SORTS[q.sort];
  const values: unknown[] = [tenantId];
  const where = ['i.tenant_id = $1'];
  const add = (v: unknown) => `$${values.push(v)}`;
  if (q.stage) where.push(`i.stage = ${add(q.stage)}`);
  if (q.source) where.push(`i.source = ${add(q.source)}`);
  if (q.assignee === UNASSIGNED) where.push('i.assignee_user_id is null');
  else if (q.assignee) where.push(`i.assignee_user_id = ${add(q.assignee)}`);
  if (q.q) {
    const like = add(`%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
    // Digits are compared only for a search shaped like a phone number: it costs a regexp per row.
    const digits = phoneSearchDigits(q.q);
    const byDigits = digits ? ` or ${phoneDigitsSql('i.phone')} like ${add(`%${digits}%`)}` : '';
    where.push(
      `(i.contact_name ilike ${like} or i.email ilike ${like} or i.site_address ilike ${like} or i.phone ilike ${like}${byDigits})`,
    );
  }
  if (q.after) {
    const c = decodeCursor(q.after, sort.cast);
    where.push(`(${sort.key}, i.id) ${sort.dir === 'desc' ? '<' : '>'} (${add(c.sortValue)}::${sort.cast}, ${add(c.id)}::uuid)`);
  }
  const text = `select ${SUMMARY_COLUMNS}, (${sort.key})::text as sort_value ${SUMMARY_FROM}
    where ${where.join(' and ')} order by ${sort.key} ${sort.dir}, i.id ${sort.dir} limit ${add(q.limit + 1)}`;
  return { text, values, name: statementName('inquiry_list', text) };
}

export type InquiryListRow = ListRow;

/** The page the list query's rows make: it asks for one row more than the page, which says there is a next one. */
export function inquiryPage(rows: InquiryListRow[], q: InquiryListQuery, today: string): KeysetPage<InquirySummary> {
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  const sortKey = SORTS[q.sort].text;
  return {
    items: page.map((r) => toSummary(r, today)),
    nextCursor:
      rows.length > q.limit && last ? encodeCursor(sortKey === 'created_at_text' ? last.created_at_text : last.sort_value, last.id) : null,
  };
}

/** The board: every stage with its count and its most recent cards (won/lost show the latest few). */
export async function getBoard(tx: TenantTx, clock: FirmClock, perColumn = 50): Promise<ItemList<BoardColumn>> {
  const likelihood = await stageLikelihoods(tx);
  const { rows: counts } = await tx.client.query<{ stage: InquiryStage; n: number }>(
    `select stage, count(*)::int as n from inquiries where tenant_id = $1 group by stage`,
    [tx.tenantId],
  );
  const countOf = new Map(counts.map((c) => [c.stage, c.n]));
  const { rows } = await tx.client.query<SummaryRow>(
    `select * from (select ${SUMMARY_COLUMNS}, i.created_at as board_at,
                           row_number() over (partition by i.stage order by i.created_at desc, i.id desc) as rn
       ${SUMMARY_FROM} where i.tenant_id = $1) ranked where rn <= $2 order by board_at desc, id desc`,
    [tx.tenantId, perColumn],
  );
  return {
    items: INQUIRY_STAGES.map((stage) => ({
      stage,
      label: STAGE_LABELS[stage],
      likelihoodPercent: likelihood[stage],
      count: countOf.get(stage) ?? 0,
      items: rows.filter((r) => r.stage === stage).map((r) => toSummary(r, clock.today)),
    })),
  };
}

/** Today lists the longest-waiting overdue follow-ups up to this many, and counts them all. */
export const OVERDUE_SHOWN = 100;

/**
 * Today: follow-ups overdue and due, and the weighted value of open inquiries. What is due today is
 * always listed whole (a day's calls); an old backlog of overdue ones is capped, with its true count.
 */
export async function getToday(tx: TenantTx, clock: FirmClock, userId?: string): Promise<TodayView> {
  const values = userId ? [tx.tenantId, clock.today, userId] : [tx.tenantId, clock.today];
  const openWhere = `i.tenant_id = $1 and i.stage not in ('won', 'lost')
    ${userId ? 'and (i.assignee_user_id = $3 or i.assignee_user_id is null)' : ''}`;
  const summaries = async (where: string) =>
    (await tx.client.query<SummaryRow>(`select ${SUMMARY_COLUMNS} ${SUMMARY_FROM} where ${where}`, values)).rows.map((r) =>
      toSummary(r, clock.today),
    );
  const dueToday = await summaries(`${openWhere} and i.next_follow_up = $2::date order by i.created_at, i.id`);
  const overdue = await summaries(
    `${openWhere} and i.next_follow_up < $2::date order by i.next_follow_up, i.created_at, i.id limit ${OVERDUE_SHOWN}`,
  );
  // Counted only when the list is full: otherwise the list is the count.
  let overdueCount = overdue.length;
  if (overdue.length === OVERDUE_SHOWN) {
    const { rows } = await tx.client.query<{ n: number }>(
      `select count(*)::int as n from inquiries i where ${openWhere} and i.next_follow_up < $2::date`,
      values,
    );
    overdueCount = rows[0]?.n ?? overdue.length;
  }
  const likelihood = await stageLikelihoods(tx);
  const { rows: open } = await tx.client.query<{ stage: InquiryStage; value: string; n: number }>(
    `select stage, coalesce(sum(estimated_value), 0)::text as value, count(*)::int as n
       from inquiries where tenant_id = $1 and stage not in ('won', 'lost') group by stage`,
    [tx.tenantId],
  );
  const pipeline = weightedPipeline(
    open.map((o) => ({ id: o.stage, value: o.value, probability: new Decimal(String(likelihood[o.stage])).div(100) })),
  );
  return {
    localDate: clock.today,
    overdue,
    overdueCount,
    dueToday,
    pipeline: {
      unweighted: pipeline.unweighted.toFixed(2),
      weighted: pipeline.weighted.toFixed(2),
      openCount: open.reduce((s, o) => s + o.n, 0),
      currency: clock.currency,
    },
  };
}
