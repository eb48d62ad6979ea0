import { sentProposal } from '../proposals/portal-fixtures';
import { linkIn } from '../testing/inbox';
import { startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('proposal expiry reminders', () => {
  it('reminds the client once, a few days before a sent proposal lapses, with a link to it', async () => {
    const p = await sentProposal(t, 'Lapsing Studio', { expiresOn: '2026-12-03', signIn: false });
    const later = await sentProposal(t, 'Not Yet Studio', { expiresOn: '2026-12-31', signIn: false });
    const sweep = () => t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [p.firmId, later.firmId] });
    await sweep();
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(p.clientEmail) && /^Reminder:/.test(m.subject ?? ''));
    expect(mail.subject).toContain('December 3, 2026');
    expect(decodeURIComponent(linkIn(mail))).toContain(`/portal/proposals/${p.version.id}`);
    await sweep();
    // A marker through the same queue: once it has arrived, any duplicate would have too.
    const marker = await sentProposal(t, 'Marker Studio', { expiresOn: '2026-12-02', signIn: false });
    await t.queue.boss.send('follow-up-sweep', { force: true, tenantIds: [marker.firmId] });
    await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(marker.clientEmail) && /^Reminder:/.test(m.subject ?? ''));
    const reminders = (email: string) =>
      t.inbox.messages.filter((m) => JSON.stringify(m.to).includes(email) && /^Reminder:/.test(m.subject ?? '')).length;
    expect(reminders(p.clientEmail)).toBe(1);
    expect(reminders(later.clientEmail)).toBe(0);
  });
});
