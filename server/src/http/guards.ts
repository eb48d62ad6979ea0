import { roleAtLeast, StaffRole } from '@layerbook/contracts';
import { readInOneTrip, readInTwoTrips, type SqlQuery, TenantTx, withTenantAndFirst } from '@layerbook/db';
import type { Request } from 'express';
import { clientRowQuery, toClientPrincipal } from '../auth/portal-auth';
import { staffRowQuery, toStaffPrincipal } from '../auth/staff-principal';
import type { AppContext } from '../context';
import type { ClientPrincipal, StaffPrincipal } from './principal';
import { forbidden, unauthorized } from './problem';
import { forgetSession, isSessionId } from './session';

/** The request's session id, when it has one express-session made (checked before it is inlined in SQL). */
const sessionIdOf = (req: Request): string | null => (isSessionId(req.sessionID) ? req.sessionID : null);

/** A session found ended in the database: this process's copy goes too, so the next request reads the truth. */
function ended(req: Request): void {
  const sid = sessionIdOf(req);
  if (sid) forgetSession(sid);
}

/**
 * Function-level and record-level authorisation in one step: opens the signed-in person's firm
 * transaction, re-checks they are an active member with at least `needed`, then runs `fn` in it.
 * owner ⊃ office ⊃ crew.
 */
export async function withStaff<T>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  fn: (tx: TenantTx, staff: StaffPrincipal) => Promise<T>,
): Promise<T> {
  const claim = req.user;
  if (!claim || claim.kind !== 'staff') throw unauthorized();
  return withTenantAndFirst(ctx.pool, claim.tenantId, staffRowQuery(claim.tenantId, claim.id, sessionIdOf(req)), async (tx, rows) => {
    const staff = toStaffPrincipal(claim.tenantId, claim.id, rows[0] as unknown as Parameters<typeof toStaffPrincipal>[2]);
    if (!staff) {
      ended(req);
      throw unauthorized('Your access has ended. Sign in again, or ask the owner.');
    }
    if (!roleAtLeast(staff.role, needed)) throw forbidden();
    return fn(tx, staff);
  });
}

/**
 * withStaff for a plain read, in ONE round trip (readInOneTrip): the person's re-check and the query
 * go together, and the rows are handed back only once the person checks out. `input` parses the
 * request and `build` makes the query from it; what they throw (a 400 naming the field) still comes
 * after the 401 or 403, as in withStaff.
 */
export async function readAsStaff<I, R = Record<string, unknown>>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  input: () => I,
  build: (tenantId: string, input: I) => SqlQuery,
): Promise<{ staff: StaffPrincipal; input: I; rows: R[] }> {
  const claim = req.user;
  if (!claim || claim.kind !== 'staff') throw unauthorized();
  let parsed: I;
  let read: SqlQuery;
  try {
    parsed = input();
    read = build(claim.tenantId, parsed);
  } catch (error) {
    await withStaff(ctx, req, needed, () => Promise.resolve());
    throw error;
  }
  const { first, rows } = await readInOneTrip(ctx.pool, claim.tenantId, staffRowQuery(claim.tenantId, claim.id, sessionIdOf(req)), read);
  const staff = toStaffPrincipal(claim.tenantId, claim.id, first[0] as unknown as Parameters<typeof toStaffPrincipal>[2]);
  if (!staff) {
    ended(req);
    throw unauthorized('Your access has ended. Sign in again, or ask the owner.');
  }
  if (!roleAtLeast(staff.role, needed)) throw forbidden();
  return { staff, input: parsed, rows: rows as R[] };
}

/**
 * withStaff for a read whose queries depend on who asks (their firm's day, their role), in TWO round
 * trips (readInTwoTrips): the person's re-check, then `build`'s queries and COMMIT, in one read-only
 * transaction. `build` runs after the re-check, so what it throws (a 400 naming the field) comes after
 * a 401 or 403.
 */
export async function readAsStaffPlanned<P extends { readonly queries: readonly SqlQuery[] }>(
  ctx: AppContext,
  req: Request,
  needed: StaffRole,
  build: (staff: StaffPrincipal) => P,
): Promise<{ staff: StaffPrincipal; planned: P; results: Record<string, unknown>[][] }> {
  const claim = req.user;
  if (!claim || claim.kind !== 'staff') throw unauthorized();
  let planned: P | undefined;
  const { checked, results } = await readInTwoTrips(
    ctx.pool,
    claim.tenantId,
    staffRowQuery(claim.tenantId, claim.id, sessionIdOf(req)),
    (first) => {
      const staff = toStaffPrincipal(claim.tenantId, claim.id, first[0] as unknown as Parameters<typeof toStaffPrincipal>[2]);
      if (!staff) {
        ended(req);
        throw unauthorized('Your access has ended. Sign in again, or ask the owner.');
      }
      if (!roleAtLeast(staff.role, needed)) throw forbidden();
      return staff;
    },
    (staff) => (planned = build(staff)).queries,
  );
  return { staff: checked, planned: planned!, results };
}

export async function withClient<T>(ctx: AppContext, req: Request, fn: (tx: TenantTx, client: ClientPrincipal) => Promise<T>): Promise<T> {
  const claim = req.user;
  if (!claim || claim.kind !== 'client') throw unauthorized('Sign in with the link we e-mail you.');
  return withTenantAndFirst(ctx.pool, claim.tenantId, clientRowQuery(claim.tenantId, claim.id, sessionIdOf(req)), async (tx, rows) => {
    const client = toClientPrincipal(claim.tenantId, claim.id, rows[0] as unknown as Parameters<typeof toClientPrincipal>[2]);
    if (!client) {
      ended(req);
      throw unauthorized('This client account is no longer active.');
    }
    return fn(tx, client);
  });
}

/** The signed-in staff member for the session answer: null when not signed in, no longer a member, or the session ended. */
export async function signedInStaff(ctx: AppContext, req: Request): Promise<StaffPrincipal | null> {
  const claim = req.user;
  if (!claim || claim.kind !== 'staff') return null;
  const staff = await withTenantAndFirst(ctx.pool, claim.tenantId, staffRowQuery(claim.tenantId, claim.id, sessionIdOf(req)), (_tx, rows) =>
    Promise.resolve(toStaffPrincipal(claim.tenantId, claim.id, rows[0] as unknown as Parameters<typeof toStaffPrincipal>[2])),
  );
  if (!staff) ended(req);
  return staff;
}

/** The signed-in client for the portal's session answer (see signedInStaff). */
export async function signedInClient(ctx: AppContext, req: Request): Promise<ClientPrincipal | null> {
  const claim = req.user;
  if (!claim || claim.kind !== 'client') return null;
  const client = await withTenantAndFirst(
    ctx.pool,
    claim.tenantId,
    clientRowQuery(claim.tenantId, claim.id, sessionIdOf(req)),
    (_tx, rows) =>
      Promise.resolve(toClientPrincipal(claim.tenantId, claim.id, rows[0] as unknown as Parameters<typeof toClientPrincipal>[2])),
  );
  if (!client) ended(req);
  return client;
}
