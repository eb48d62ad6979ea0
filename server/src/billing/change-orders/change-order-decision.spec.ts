import type { ItemList, PortalProposalSummary } from '@layerbook/contracts';
import { firms, withTenant } from '@layerbook/db';
import Decimal from 'decimal.js';
import { otherClientOf, sentProposal } from '../../proposals/portal-fixtures';
import { startTestServer, TestServer } from '../../testing/harness';
import { acceptedJob, addChangeOrder, jobMoney, markBilled, sendChangeOrder } from './change-order-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const lump = (title: string, price: string) => ({ title, description: '', pricing: { kind: 'lumpSum' as const, price } });
const sum = (amounts: string[]) => amounts.reduce((a, b) => a.plus(b), new Decimal(0)).toFixed(2);
const approve = { decision: 'approve', signedName: 'Edwina Marl', consent: true };

describe('change orders in the portal', () => {
  it('approval moves the contract sum and re-spreads only the unbilled lines, which still add up exactly', async () => {
    const f = await acceptedJob(t, 'Approve Plaster');
    await markBilled(t, f, [1]);
    const before = await jobMoney(t, f);
    const made = await sendChangeOrder(f, (await addChangeOrder(f, lump('Venetian niche', '1000.00'))).id);
    // Sent and waiting: nothing has moved yet.
    expect(await jobMoney(t, f)).toEqual(before);

    const read = await f.client.agent.get(`/api/portal/change-orders/${made.id}`);
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({
      number: 1,
      jobTitle: 'Dining room plaster',
      status: 'sent',
      amount: '1082.50',
      contractSumBefore: before.contract_sum,
      contractSumAfter: new Decimal(before.contract_sum).plus('1082.50').toFixed(2),
    });
    // the firm's zone, so the portal shows when it was answered as the firm's day and time
    const zone = await withTenant(t.ctx.pool, f.firmId, (tx) => tx.db.select({ timeZone: firms.timeZone }).from(firms));
    expect(read.body.timeZone).toBe(zone[0].timeZone);

    const res = await f.client.agent
      .post(`/api/portal/change-orders/${made.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send(approve);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      status: 'approved',
      signedName: 'Edwina Marl',
      decidedAt: '2026-12-01T15:00:00.000Z',
      timeZone: zone[0].timeZone,
    });

    const after = await jobMoney(t, f);
    const newSum = new Decimal(before.contract_sum).plus('1082.50').toFixed(2);
    expect(after.contract_sum).toBe(newSum);
    expect(after.contract_tax).toBe(new Decimal(before.contract_tax).plus('82.50').toFixed(2));
    // The billed deposit never changes; the other two take the change in proportion and the lines add up to the new sum.
    expect(after.lines[0]).toEqual(before.lines[0]);
    expect(after.lines.map((l) => l.id)).toEqual(before.lines.map((l) => l.id));
    expect(new Decimal(after.lines[1].amount).greaterThan(before.lines[1].amount)).toBe(true);
    expect(new Decimal(after.lines[2].amount).greaterThan(before.lines[2].amount)).toBe(true);
    expect(sum(after.lines.map((l) => l.amount))).toBe(newSum);
    expect(sum(after.lines.slice(1).map((l) => l.amount))).toBe(
      new Decimal(sum(before.lines.slice(1).map((l) => l.amount))).plus('1082.50').toFixed(2),
    );
    // The progress payment was asked for as 40 %: it now shows its share of the new sum; the final stays "the rest".
    const percents = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query<{ percent: string | null }>(
        `select trim_scale(percent)::text as percent from payment_schedule_lines where tenant_id = $1 and job_id = $2 order by position`,
        [tx.tenantId, f.jobId],
      ),
    );
    expect(percents.rows.map((r) => r.percent)).toEqual([
      '30',
      new Decimal(after.lines[1].amount).div(newSum).times(100).toDecimalPlaces(2).toFixed(),
      null,
    ]);
    expect(after.valueLines.at(-1)).toEqual({
      label: 'Change order #1: Venetian niche',
      scheduled_value: '1082.50',
      change_order_id: made.id,
    });
    // The sums the client approved stay as they were, whatever comes later.
    expect((await f.agent.get(`/api/change-orders/${made.id}`)).body).toMatchObject({
      contractSumBefore: before.contract_sum,
      contractSumAfter: newSum,
    });

    const audit = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query<{ action: string }>(
        `select action from audit_log where tenant_id = $1 and entity = 'change_order' and entity_id = $2 order by created_at`,
        [tx.tenantId, made.id],
      ),
    );
    expect(audit.rows.map((r) => r.action)).toEqual(['change_order.created', 'change_order.sent', 'change_order.approved']);
    await t.inbox.waitFor((m) => (m.subject ?? '') === 'Edwina Marl approved change order #1: Venetian niche');

    const twice = await f.client.agent
      .post(`/api/portal/change-orders/${made.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send(approve);
    expect(twice.status).toBe(409);
    expect(await jobMoney(t, f)).toEqual(after);
  });

  it('a deduction re-spreads down; when every line is billed the change becomes its own stage payment before the final', async () => {
    const f = await acceptedJob(t, 'All Billed Plaster');
    const down = await sendChangeOrder(f, (await addChangeOrder(f, lump('Leave out the border', '-100.00'))).id);
    await markBilled(t, f, [1], 'ready');
    const before = await jobMoney(t, f);
    await f.client.agent.post(`/api/portal/change-orders/${down.id}/decision`).set('x-csrf-token', f.client.csrf()).send(approve);
    const cut = await jobMoney(t, f);
    expect(cut.contract_sum).toBe(new Decimal(before.contract_sum).minus('108.25').toFixed(2));
    expect(cut.lines[0].amount).toBe(before.lines[0].amount);
    expect(sum(cut.lines.map((l) => l.amount))).toBe(cut.contract_sum);

    await markBilled(t, f, [1, 2, 3]);
    const extra = await sendChangeOrder(f, (await addChangeOrder(f, lump('Hall ceiling', '200.00'))).id);
    await f.client.agent.post(`/api/portal/change-orders/${extra.id}/decision`).set('x-csrf-token', f.client.csrf()).send(approve);
    const grown = await jobMoney(t, f);
    expect(grown.lines.map((l) => [l.position, l.role, l.amount, l.status])).toEqual([
      [1, 'deposit', cut.lines[0].amount, 'invoiced'],
      [2, 'milestone', cut.lines[1].amount, 'invoiced'],
      [3, 'milestone', '216.50', 'draft'],
      [4, 'final', cut.lines[2].amount, 'invoiced'],
    ]);
    expect(grown.lines[2]).toMatchObject({ label: 'Change order #2: Hall ceiling', trigger: { kind: 'walkthrough' } });
    expect(sum(grown.lines.map((l) => l.amount))).toBe(grown.contract_sum);
  });

  it('an approved change reaches the crew’s job sheet, without its price; a sent one does not yet', async () => {
    const f = await acceptedJob(t, 'Sheet Change Plaster');
    const made = await sendChangeOrder(
      f,
      (await addChangeOrder(f, { ...lump('Venetian niche', '1000.00'), description: 'Polished lime in the landing niche.' })).id,
    );
    const sheet = async () => (await f.agent.get(`/api/jobs/${f.jobId}/sheet`)).body as { changes: unknown[] };
    expect((await sheet()).changes).toEqual([]);
    await f.client.agent.post(`/api/portal/change-orders/${made.id}/decision`).set('x-csrf-token', f.client.csrf()).send(approve);
    const read = await sheet();
    expect(read.changes).toEqual([
      {
        number: 1,
        title: 'Venetian niche',
        description: 'Polished lime in the landing niche.',
        approvedOn: '2026-12-01',
        finishName: null,
        surfaces: [],
      },
    ]);
    expect(JSON.stringify(read.changes)).not.toMatch(/1000|1082/);
  });

  it('is not sent when the client could not approve it: the sum to zero or below, or a deduction with every payment billed', async () => {
    const f = await acceptedJob(t, 'Unsendable Plaster');
    const whole = await jobMoney(t, f);
    const send = (id: string) => f.agent.post(`/api/change-orders/${id}/send`).set('x-csrf-token', f.csrf()).send({});
    // Half the job out: a draft that still leaves a contract, until another change takes the sum down.
    const tooMuch = await addChangeOrder(f, lump('Leave half out', `-${new Decimal(whole.contract_sum).div(2).toFixed(2)}`));
    await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query(`update jobs set contract_sum = round(contract_sum * 0.4, 2) where tenant_id = $1 and id = $2`, [
        tx.tenantId,
        f.jobId,
      ]),
    );
    const refused = await send(tooMuch.id);
    expect(refused.status).toBe(409);
    expect(refused.body.detail).toContain('zero or below');
    await markBilled(t, f, [1, 2, 3]);
    const late = await addChangeOrder(f, lump('Leave out the border', '-100.00'));
    expect((await send(late.id)).body.detail).toContain('already billed');
    // neither went to the client: both are still drafts
    const statuses = await withTenant(t.ctx.pool, f.firmId, (tx) =>
      tx.client.query<{ status: string }>(`select status from change_orders where tenant_id = $1 and job_id = $2 order by number`, [
        tx.tenantId,
        f.jobId,
      ]),
    );
    expect(statuses.rows.map((r) => r.status)).toEqual(['draft', 'draft']);
  });

  it('a decline changes nothing but the change order; a draft is not the client’s to read', async () => {
    const f = await acceptedJob(t, 'Decline Plaster');
    const draft = await addChangeOrder(f, lump('Gilded cornice', '900.00'));
    expect((await f.client.agent.get(`/api/portal/change-orders/${draft.id}`)).status).toBe(404);
    const made = await sendChangeOrder(f, draft.id);
    const before = await jobMoney(t, f);
    const res = await f.client.agent
      .post(`/api/portal/change-orders/${made.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send({ decision: 'decline', comment: 'Not this year.' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'declined', clientComment: 'Not this year.', signedName: null });
    expect(await jobMoney(t, f)).toEqual(before);
    const again = await f.client.agent
      .post(`/api/portal/change-orders/${made.id}/decision`)
      .set('x-csrf-token', f.client.csrf())
      .send(approve);
    expect(again.status).toBe(409);
    expect(await jobMoney(t, f)).toEqual(before);

    // The client's projects list names the sent ones on the job (one waiting first), never a draft.
    const waiting = await sendChangeOrder(f, (await addChangeOrder(f, lump('Lime wash, hall', '300.00'))).id);
    await addChangeOrder(f, lump('Not sent yet', '50.00'));
    const projects = (await f.client.agent.get('/api/portal/proposals')).body as ItemList<PortalProposalSummary>;
    expect(projects.items).toHaveLength(1);
    expect(projects.items[0].changeOrders).toEqual([
      { id: waiting.id, number: 2, title: 'Lime wash, hall', status: 'sent', amount: expect.any(String), currency: 'USD' },
      { id: made.id, number: 1, title: 'Gilded cornice', status: 'declined', amount: expect.any(String), currency: 'USD' },
    ]);
  });

  it('approval needs a typed signature (400 naming the field); other clients and other firms get 404', async () => {
    const f = await acceptedJob(t, 'Signature Plaster');
    const made = await sendChangeOrder(f, (await addChangeOrder(f, lump('Extra niche', '400.00'))).id);
    const decide = (body: object) =>
      f.client.agent.post(`/api/portal/change-orders/${made.id}/decision`).set('x-csrf-token', f.client.csrf()).send(body);
    const fields = async (body: object) => {
      const res = await decide(body);
      expect(res.status).toBe(400);
      return (res.body.errors as Array<{ field: string }>).map((e) => e.field);
    };
    expect(await fields({ decision: 'approve', consent: true })).toEqual(['signedName']);
    expect(await fields({ decision: 'approve', signedName: 'E', consent: true })).toEqual(['signedName']);
    expect(await fields({ decision: 'approve', signedName: 'Edwina Marl' })).toEqual(['consent']);
    expect(await fields({ decision: 'maybe' })).toEqual(['decision']);

    const neighbour = await otherClientOf(t, f);
    expect((await neighbour.agent.get(`/api/portal/change-orders/${made.id}`)).status).toBe(404);
    expect(
      (await neighbour.agent.post(`/api/portal/change-orders/${made.id}/decision`).set('x-csrf-token', neighbour.csrf()).send(approve))
        .status,
    ).toBe(404);
    const other = await sentProposal(t, 'Other Signature Plaster');
    expect((await other.client.agent.get(`/api/portal/change-orders/${made.id}`)).status).toBe(404);
    expect((await f.agent.get(`/api/portal/change-orders/${made.id}`)).status).toBe(401);
    expect((await f.client.agent.get(`/api/change-orders/${made.id}`)).status).toBe(401);
    expect((await f.client.agent.get(`/api/portal/change-orders/${made.id}`)).body.status).toBe('sent');
  });
});
