import type { StaffRole } from '@layerbook/contracts';
import { readManyInOneTrip, withTenantAndFirst, type SqlQuery, type TenantTx } from '@layerbook/db';
import type { Request } from 'express';
import type { AppContext } from '../context';
import { readAsStaffPlanned, withStaff } from '../http/guards';
import type { StaffPrincipal } from '../http/principal';

/**
 * PostgreSQL "SET TRANSACTION": a transaction may always be made read-only, even after its first
 * query (only the way back to read-write is refused), so it can follow the firm setting in the
 * first round trip.
 */
const READ_ONLY = 'set transaction read only';

/**
 * For reports that only read (the cash figures and CSV exports): withStaff, but `fn` runs in a
 * read-only firm transaction, on the read replica when one is configured (ctx.readPool, from
 * DATABASE_READ_URL) and on the primary otherwise. Either way under the same app role and
 * row-level security, the firm set transaction-locally.
 *
 * With a replica, who may read is still decided on the primary, in a transaction of its own: a
 * sign-out, an ended session or a removed member takes effect at once whatever the replica's lag.
 * The figures themselves may then trail the primary by that lag (milliseconds on a healthy
 * standby), which a report can bear.
 */
export async function withStaffReport<T>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  fn: (tx: TenantTx, staff: StaffPrincipal) => Promise<T>,
): Promise<T> {
  const replica = ctx.readPool;
  if (!replica) {
    return withStaff(ctx, req, needed, async (tx, staff) => {
      await tx.client.query(READ_ONLY);
      return fn(tx, staff);
    });
  }
  const staff = await withStaff(ctx, req, needed, (_tx, s) => Promise.resolve(s));
  return withTenantAndFirst(replica, staff.tenantId, READ_ONLY, (tx) => fn(tx, staff));
}

type Rows = Record<string, unknown>[];

/** A report's queries, made once who asks is known, and the answer made from their rows (in the same order). */
export interface ReportPlan<T> {
  readonly queries: readonly SqlQuery[];
  readonly answer: (results: Rows[]) => T;
}

/**
 * withStaffReport for reads that are a fixed set of queries: on the primary in two round trips (the
 * person's re-check, then every query and COMMIT: readAsStaffPlanned); with a replica, the re-check on
 * the primary and the queries on the replica in one. `plan` runs after the re-check, so a 400 from
 * parsing the request still comes after a 401 or 403.
 */
export async function readReport<T>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  plan: (staff: StaffPrincipal) => ReportPlan<T>,
): Promise<T> {
  const replica = ctx.readPool;
  if (!replica) {
    const { planned, results } = await readAsStaffPlanned(ctx, req, needed, plan);
    return planned.answer(results);
  }
  const staff = await withStaff(ctx, req, needed, (_tx, s) => Promise.resolve(s));
  const planned = plan(staff);
  return planned.answer(await readManyInOneTrip(replica, staff.tenantId, planned.queries));
}
