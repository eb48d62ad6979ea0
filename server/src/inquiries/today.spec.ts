import { withTenant } from '@layerbook/db';
import type { TodayView } from '@layerbook/contracts';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { OVERDUE_SHOWN } from './list';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('Today', () => {
  it('still lists what is due today behind a long backlog of overdue follow-ups, and counts the backlog whole', async () => {
    const o = await signUpFirm(t.app, 'Backlog Plaster');
    const today = (await o.agent.get('/api/inquiries/today')).body.localDate as string;
    // A backlog of 205 stale web inquiries nobody closed, each with an old follow-up date, and two closed ones.
    await withTenant(t.ctx.pool, o.firmId, (tx) =>
      tx.client.query(
        `insert into inquiries (tenant_id, contact_name, source, next_follow_up, stage)
           select $1, 'Old lead ' || g, 'web_form', date '2025-01-01' + (g % 30), case when g > 205 then 'lost' else 'new' end
             from generate_series(1, 207) g`,
        [tx.tenantId],
      ),
    );
    const due = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Call Back Today', source: 'phone', nextFollowUp: today });
    expect(due.status).toBe(201);
    const view = (await o.agent.get('/api/inquiries/today')).body as TodayView;
    expect(view.dueToday.map((i) => i.contactName)).toEqual(['Call Back Today']);
    expect([view.overdue.length, view.overdueCount]).toEqual([OVERDUE_SHOWN, 205]);
    // the longest waiting first
    expect(view.overdue[0]?.nextFollowUp).toBe('2025-01-01');
    expect(view.overdue.every((i) => i.isFollowUpOverdue)).toBe(true);
  });

  it('counts a short overdue list as it is', async () => {
    const o = await signUpFirm(t.app, 'Short Backlog Plaster');
    await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Late Lead', source: 'phone', nextFollowUp: '2020-03-01' });
    const view = (await o.agent.get('/api/inquiries/today')).body as TodayView;
    expect([view.overdue.map((i) => i.contactName), view.overdueCount, view.dueToday]).toEqual([['Late Lead'], 1, []]);
  });
});
