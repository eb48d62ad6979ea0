import { DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import { joinAs } from './proposal-fixtures';
import { sentProposal } from './portal-fixtures';
import { startTestServer, type TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('the "proposal accepted" e-mails when the firm issues the deposit at acceptance', () => {
  it('does not tell the office to check the schedule "before the deposit invoice goes out" — it already went out', async () => {
    const p = await sentProposal(t, 'Already Sent Plaster');
    const office = await joinAs(t, p, 'office');
    const officeEmail = (await office.agent.get('/api/auth/session')).body.user.email as string;
    const saved = await p.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', p.csrf())
      .send({ ...DEFAULT_BILLING_SETTINGS, depositAtAcceptance: 'issueAndSend' });
    expect(saved.status).toBe(200);
    const res = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(res.status).toBe(200);
    expect(res.body.depositInvoiceId).toEqual(expect.any(String));
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(officeEmail) && /accepted/.test(m.subject ?? ''));
    expect(mail.text).not.toContain('before the deposit invoice goes out');
    expect(mail.text).toMatch(/deposit invoice \S+ was issued and e-mailed to the client/);
    // the client's copy says the deposit invoice came in its own e-mail, not that the firm "will be in touch about the deposit"
    const copy = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(p.clientEmail) && /You accepted/.test(m.subject ?? ''));
    expect(copy.text).toMatch(/sent the deposit invoice \S+ in a separate e-mail/);
  }, 60_000);
});
