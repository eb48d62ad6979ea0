import { startTestServer, TestServer } from '../testing/harness';
import { joinAs } from '../proposals/proposal-fixtures';
import { sentProposal } from '../proposals/portal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

describe('accepted work (jobs) for the office', () => {
  it('lists and shows jobs to owner and office; crew get 403 (money); another firm 404', async () => {
    const p = await sentProposal(t, 'Job Desk Plaster');
    const res = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(res.status).toBe(200);
    const optionA = p.version.snapshot.options.find((o) => o.id === 'A')!;

    const list = await p.agent.get('/api/jobs');
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    const job = list.body.items[0];
    expect(job).toMatchObject({
      title: 'Dining room plaster',
      clientName: 'Edwina Marl',
      optionLabel: 'Polished lime',
      contractSum: optionA.total,
      currency: 'USD',
      status: 'scheduled',
      startDate: '2026-12-07',
    });
    const detail = await p.agent.get(`/api/jobs/${job.id}`);
    expect(detail.status).toBe(200);
    expect(detail.body).toMatchObject({ proposalVersionId: p.version.id, estimateId: p.estimateId, acceptedVariantId: 'A' });
    expect(Object.keys(detail.body).sort()).toEqual([
      'acceptedVariantId',
      'clientId',
      'clientName',
      'contractSum',
      'createdAt',
      'currency',
      'estimateId',
      'finishDate',
      'id',
      'inquiryId',
      'optionLabel',
      'paymentSchedule',
      'proposalVersionId',
      'siteAddress',
      'siteId',
      'startDate',
      'status',
      'title',
    ]);
    expect(typeof detail.body.siteAddress).toBe('string');
    const lines = detail.body.paymentSchedule as Array<{ position: number; role: string; percent: string | null; amount: string }>;
    // Percentages as decimal strings with no trailing zeros, as the office asked for them.
    expect(lines.map((l) => [l.position, l.role, l.percent])).toEqual([
      [1, 'deposit', '30'],
      [2, 'milestone', '40'],
      [3, 'final', null],
    ]);
    expect(lines.map((l) => l.amount)).toEqual(optionA.payments.map((pay) => pay.amount));
    // The progress payment names the layer it waits for, as the accepted option's schedule does.
    const progress = optionA.payments.find((pay) => pay.trigger.kind === 'layerComplete')!;
    const layerId = progress.trigger.kind === 'layerComplete' ? progress.trigger.layerId : '';
    const layerName = optionA.schedule.milestones.find((m) => m.id === `layer:${layerId}`)!.label;
    expect(layerName).toBeTruthy();
    expect(detail.body.paymentSchedule.map((l: { layerName: string | null }) => l.layerName)).toEqual([null, layerName, null]);
    expect(progress.label).toContain(layerName);

    const office = await joinAs(t, p, 'office');
    expect((await office.agent.get(`/api/jobs/${job.id}`)).status).toBe(200);
    const crew = await joinAs(t, p, 'crew');
    expect((await crew.agent.get('/api/jobs')).status).toBe(403);
    expect((await crew.agent.get(`/api/jobs/${job.id}`)).status).toBe(403);

    const other = await sentProposal(t, 'Other Job Plaster', { signIn: false });
    expect((await other.agent.get(`/api/jobs/${job.id}`)).status).toBe(404);
    expect((await other.agent.get('/api/jobs')).body.items).toEqual([]);
    expect((await p.agent.get('/api/jobs/not-a-uuid')).status).toBe(400);
    expect((await p.client.agent.get('/api/jobs')).status).toBe(401);
  });
});
