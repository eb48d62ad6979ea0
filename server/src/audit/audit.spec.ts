import type { AuditEntry, AuditPage } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import fc from 'fast-check';
import { PRIMER } from '../library/library-fixtures';
import { joinAs } from '../proposals/proposal-fixtures';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
let a: Awaited<ReturnType<typeof signUpFirm>>;
let b: Awaited<ReturnType<typeof signUpFirm>>;
let office: Awaited<ReturnType<typeof joinAs>>;
let crew: Awaited<ReturnType<typeof joinAs>>;
let officeUserId: string;
let productId: string;
let bClientId: string;

/** An entry written as the server writes them, at a chosen instant (the column's default is the database clock). */
async function logAt(firmId: string, at: string, action: string, data: Record<string, unknown> = {}, actorUserId: string | null = null) {
  await withTenant(t.ctx.pool, firmId, (tx) =>
    tx.client.query(
      `insert into audit_log (tenant_id, actor_user_id, actor_kind, action, entity, entity_id, data, created_at)
       values ($1, $2, $3, $4, 'invoice', gen_random_uuid(), $5, $6)`,
      [tx.tenantId, actorUserId, actorUserId ? 'staff' : 'system', action, data, at],
    ),
  );
}

const list = async (query = '') => {
  const res = await a.agent.get(`/api/audit${query}`);
  expect(res.status).toBe(200);
  return res.body as AuditPage;
};
const actions = (page: AuditPage) => page.items.map((e) => e.action);

beforeAll(async () => {
  t = await startTestServer();
  a = await signUpFirm(t.app, 'Audit Lime Works');
  b = await signUpFirm(t.app, 'Other Wax Rooms');
  office = await joinAs(t, a, 'office');
  crew = await joinAs(t, a, 'crew');
  officeUserId = ((await office.agent.get('/api/auth/session')).body as { user: { id: string } }).user.id;

  const made = await a.agent.post('/api/library/products').set('x-csrf-token', a.csrf()).send(PRIMER);
  expect(made.status).toBe(201);
  productId = made.body.id;
  const byOffice = await office.agent
    .post('/api/clients')
    .set('x-csrf-token', office.csrf())
    .send({ kind: 'homeowner', name: 'Ida Umber', email: 'ida@umber.example' });
  expect(byOffice.status).toBe(201);
  const inB = await b.agent
    .post('/api/clients')
    .set('x-csrf-token', b.csrf())
    .send({ kind: 'homeowner', name: 'Bea Other', email: 'bea@other.example' });
  bClientId = inB.body.id;
  await b.agent.post('/api/library/products').set('x-csrf-token', b.csrf()).send(PRIMER);

  // Firm A's zone is America/New_York (the sign-up default): 03:30 UTC on 1 December is still 30 November there.
  await logAt(a.firmId, '2026-11-30T15:00:00Z', 'invoice.issued', { number: 'INV-0001', total: '1200.00', dueOn: '2026-12-30' }, a.userId);
  await logAt(a.firmId, '2026-12-01T03:30:00Z', 'invoice.voided', { reason: 'Wrong room', creditNote: 'CN-0001' }, a.userId);
  await logAt(a.firmId, '2026-12-01T15:00:00Z', 'invoice.refund_recorded', { amount: '50.00', receipt: 'RCT-0002' });
}, 120_000);
afterAll(() => t.stop());

describe('GET /api/audit', () => {
  it('is the owner’s alone: office and crew get 403, before any query is read', async () => {
    expect((await office.agent.get('/api/audit')).status).toBe(403);
    expect((await crew.agent.get('/api/audit?kind=nonsense')).status).toBe(403);
    expect((await office.agent.get('/api/firm/export')).status).toBe(403);
  });

  it('names the bad field in a 400', async () => {
    const field = async (query: string) => {
      const res = await a.agent.get(`/api/audit?${query}`);
      expect(res.status).toBe(400);
      expect(res.headers['content-type']).toContain('application/problem+json');
      return (res.body.errors as { field: string }[]).map((e) => e.field);
    };
    expect(await field('kind=everything')).toEqual(['kind']);
    expect(await field('person=someone')).toEqual(['person']);
    expect(await field('record=INV-0001')).toEqual(['record']);
    expect(await field('from=2026-02-30')).toEqual(['from']);
    expect(await field('from=2026-12-02&to=2026-12-01')).toEqual(['to']);
    expect(await field('action=DROP%20TABLE')).toEqual(['action']);
    expect(await field('limit=0')).toEqual(['limit']);
    expect(await field('after=not-a-cursor')).toEqual(['after']);
    expect(await field('colour=red')).toEqual(['colour']);
  });

  it('lists newest first with who did it, what and on which record, in a sentence', async () => {
    const page = await list();
    const product = page.items.find((e) => e.action === 'product.created');
    expect(product).toMatchObject({
      actor: { kind: 'staff', id: a.userId, name: 'Olive Owner', email: a.email },
      kind: 'library',
      entity: 'product',
      entityId: productId,
      summary: 'Added product Acrylic primer',
      link: { area: 'products', id: null },
    } satisfies Partial<AuditEntry>);
    const issued = page.items.find((e) => e.action === 'invoice.issued');
    expect(issued?.summary).toBe('Issued invoice INV-0001 for 1200.00, due 2026-12-30');
    expect(issued?.link).toEqual({ area: 'invoice', id: issued?.entityId });
    const refund = page.items.find((e) => e.action === 'invoice.refund_recorded');
    expect(refund?.actor).toEqual({ kind: 'system', id: null, name: null, email: null });
    const times = page.items.map((e) => e.at);
    expect([...times].sort().reverse()).toEqual(times);
  });

  it('filters by person, kind, exact action and record', async () => {
    const byOffice = await list(`?person=${officeUserId}`);
    expect(actions(byOffice)).toContain('client.created');
    expect(byOffice.items.every((e) => e.actor.id === officeUserId)).toBe(true);

    expect(actions(await list('?kind=library'))).toEqual(['product.created']);
    expect(actions(await list('?kind=voids'))).toEqual(['invoice.voided']);
    expect(actions(await list('?kind=payments'))).toEqual(['invoice.refund_recorded']);
    expect(actions(await list('?kind=invoices'))).toEqual(['invoice.issued']);
    expect(actions(await list('?action=invoice.voided'))).toEqual(['invoice.voided']);
    expect(actions(await list(`?record=${productId}`))).toEqual(['product.created']);
    expect(actions(await list(`?kind=clients&person=${a.userId}`))).toEqual([]);
  });

  it("takes from and to as the firm's calendar days", async () => {
    // 03:30 UTC on 1 December is 22:30 on 30 November in New York.
    expect(actions(await list('?from=2026-11-30&to=2026-11-30'))).toEqual(['invoice.voided', 'invoice.issued']);
    expect(actions(await list('?from=2026-12-01&to=2026-12-01'))).toEqual(['invoice.refund_recorded']);
  });

  it('pages by keyset without losing or repeating an entry', async () => {
    const all = await list('?limit=100');
    const seen: string[] = [];
    let after: string | null = null;
    do {
      const page: AuditPage = await list(`?limit=2${after ? `&after=${after}` : ''}`);
      expect(page.items.length).toBeLessThanOrEqual(2);
      seen.push(...page.items.map((e) => e.id));
      after = page.nextCursor;
    } while (after);
    expect(seen).toEqual(all.items.map((e) => e.id));
    expect(all.nextCursor).toBeNull();
  });

  it("never shows another firm's entries, whatever the filter", async () => {
    const mine = await list('?limit=100');
    const theirs = await b.agent.get('/api/audit?limit=100');
    const theirIds = new Set((theirs.body as AuditPage).items.map((e) => e.id));
    expect(theirIds.size).toBeGreaterThan(0);
    expect(mine.items.some((e) => theirIds.has(e.id))).toBe(false);
    expect((await list(`?record=${bClientId}`)).items).toEqual([]);
    expect((await list(`?person=${b.userId}`)).items).toEqual([]);
  });

  it('answers any mix of odd filter values with a page or a 400, never a 5xx', async () => {
    const day = fc.oneof(
      fc.constantFrom('2026-12-01', '1900-01-01', '2999-12-31', '0000-00-00', '2026-02-29'),
      fc.string({ maxLength: 12 }),
    );
    const value = fc.oneof(
      fc.string({ maxLength: 40 }),
      day,
      fc.uuid(),
      fc.constantFrom('signIns', 'invoice.issued', 'x._', '%', '%25', '100', '-1'),
    );
    const query = fc
      .array(fc.tuple(fc.constantFrom('person', 'kind', 'action', 'record', 'from', 'to', 'after', 'limit', 'q'), value), { maxLength: 5 })
      .map((pairs) => pairs.map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join('&'));
    await fc.assert(
      fc.asyncProperty(query, async (q) => {
        const res = await a.agent.get(`/api/audit?${q}`);
        expect({ q, status: res.status < 500 }).toEqual({ q, status: true });
      }),
      { numRuns: 60 },
    );
  });
});
