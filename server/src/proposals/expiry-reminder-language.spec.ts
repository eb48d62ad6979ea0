import { withTenant } from '@layerbook/db';
import { firmWithPricedEstimate } from './proposal-fixtures';
import { makeAndSend } from './portal-fixtures';
import { startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the expiry reminder of a Spanish-reading client', () => {
  it('is in the client’s language with the date written out, like the proposal e-mail it follows', async () => {
    const f = await firmWithPricedEstimate(t, 'Cal y Arena Studio');
    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update clients set language = 'es' where id = $1`, [f.clientId]));
    await makeAndSend(t, f, '2026-12-03');
    const sentMail = t.inbox.messages.find((m) => JSON.stringify(m.to).includes(f.clientEmail))!;
    // The proposal e-mail itself is in Spanish with a long date.
    expect(sentMail.text).toContain('diciembre');
    await t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [f.firmId] });
    const reminder = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(f.clientEmail) && m !== sentMail);
    expect(reminder.subject).not.toMatch(/^Reminder:/);
    expect(reminder.text).not.toContain('2026-12-03');
    expect(reminder.text).toContain('3 de diciembre de 2026');
  });
});
