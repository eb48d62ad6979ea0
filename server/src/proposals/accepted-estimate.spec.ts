import type { EstimateView, ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import type { Test } from 'supertest';
import { startTestServer, TestServer } from '../testing/harness';
import { otherClientOf, sentProposal } from './portal-fixtures';
import { pdfText } from './pdf/pdf-text';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const WHY = 'This estimate was accepted and is now read-only: its price is the job’s contract sum. Changes go through a change order.';

describe('an accepted estimate is read-only', () => {
  it('answers 409 naming the change order to every write, and its total stays the job’s contract sum', async () => {
    const p = await sentProposal(t, 'Settled Sum Plaster');
    const accepted = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'A', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);
    const before = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
    expect(before.status).toBe('accepted');

    const expectRefused = (res: { status: number; headers: Record<string, string>; body: { detail?: string } }) => {
      expect(res.status).toBe(409);
      expect(res.headers['content-type']).toContain('application/problem+json');
      expect(res.body.detail).toBe(WHY);
    };
    // an option dropped, an add-on priced higher: both would change the total
    const edited = {
      ...before.inputs,
      variants: before.inputs.variants.slice(0, 1),
      addOns: [{ id: 'stencil', label: 'Stencilled border', labourHours: 60, materialsCost: '400.00' }],
    };
    expectRefused(await p.agent.put(`/api/estimates/${p.estimateId}/inputs`).set('x-csrf-token', p.csrf()).send(edited));
    expectRefused(
      await p.agent.post('/api/proposals').set('x-csrf-token', p.csrf()).send({ estimateId: p.estimateId, expiresOn: '2026-12-30' }),
    );
    expectRefused(await p.agent.patch(`/api/proposals/${p.version.id}`).set('x-csrf-token', p.csrf()).send({ notes: 'A late note' }));
    expectRefused(await p.agent.post(`/api/proposals/${p.version.id}/send`).set('x-csrf-token', p.csrf()).send({}));

    const after = (await p.agent.get(`/api/estimates/${p.estimateId}`)).body as EstimateView;
    expect(after.inputs).toEqual(before.inputs);
    expect(after.price).toBe(before.price);
    const version = (await p.agent.get(`/api/proposals/${p.version.id}`)).body as ProposalVersionView;
    expect(version.snapshotHash).toBe(p.version.snapshotHash);
    const listed = (await p.agent.get('/api/estimates')).body as { items: Array<{ id: string; price: string | null }> };
    const job = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query<{ contract_sum: string }>(`select contract_sum::text from jobs where estimate_id = $1`, [p.estimateId]),
    );
    const optionA = p.version.snapshot.options.find((o) => o.id === 'A')!;
    expect(job.rows[0].contract_sum).toBe(optionA.total);
    expect(listed.items.find((i) => i.id === p.estimateId)?.price).toBe(before.price);
  });
});

describe('after acceptance', () => {
  it('the office e-mail’s "Open the job" opens the job the acceptance made', async () => {
    const p = await sentProposal(t, 'Open Job Stucco');
    const ownerEmail = (await p.agent.get('/api/auth/session')).body.user.email as string;
    const accepted = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'B', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);
    const job = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query<{ id: string }>(`select id from jobs where estimate_id = $1`, [p.estimateId]),
    );
    const mail = await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(ownerEmail) && /accepted/.test(m.subject ?? ''));
    expect(mail.text).toContain(`Open the job`);
    expect(mail.text).toContain(`/jobs/${job.rows[0].id}`);
    expect(mail.text).not.toContain('/estimates/');
  });
});

/** The request with its binary body (the PDF) collected as a Buffer. */
const withPdfBody = (req: Test) =>
  req.buffer(true).parse((r, done) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => done(null, Buffer.concat(chunks)));
  });

describe('the signed copy', () => {
  it('after acceptance the client downloads a PDF with the typed name, the time in the firm’s zone, the option, the IP and the SHA-256', async () => {
    const p = await sentProposal(t, 'Signed Copy Plaster');
    const url = `/api/portal/proposals/${p.version.id}/signed-pdf`;
    const early = await p.client.agent.get(url);
    expect(early.status).toBe(409);
    expect(early.body.detail).toBe('There is a signed copy only once the proposal is accepted.');

    const accepted = await p.client.agent
      .post(`/api/portal/proposals/${p.version.id}/accept`)
      .set('x-csrf-token', p.client.csrf())
      .send({ variantId: 'B', signedName: 'Edwina Marl', consent: true });
    expect(accepted.status).toBe(200);
    const res = await withPdfBody(p.client.agent.get(url));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe('attachment; filename="proposal-dining-room-plaster-v1-signed.pdf"');
    const text = pdfText(res.body as Buffer).replace(/\s+/g, ' ');
    const stored = await withTenant(t.ctx.pool, p.firmId, (tx) =>
      tx.client.query<{ signed_ip: string }>(`select signed_ip from proposal_versions where id = $1`, [p.version.id]),
    );
    const optionB = p.version.snapshot.options.find((o) => o.id === 'B')!;
    const usd = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(optionB.total as unknown as number);
    expect(text).toContain('Signed copy: acceptance record');
    expect(text).toContain('Edwina Marl');
    // accepted at 15:00 UTC: 10:00 in New York, the firm's zone
    expect(text).toContain('December 1, 2026 at 10:00 AM EST');
    expect(text).toContain(`${optionB.label}: ${usd}`);
    expect(stored.rows[0].signed_ip).toMatch(/127\.0\.0\.1/);
    expect(text).toContain(stored.rows[0].signed_ip);
    expect(p.version.snapshotHash).toMatch(/^[0-9a-f]{64}$/);
    expect(text).toContain(p.version.snapshotHash);

    // the plain PDF has no acceptance record; another client of the firm gets 404
    const plain = await withPdfBody(p.client.agent.get(`/api/portal/proposals/${p.version.id}/pdf`));
    expect(pdfText(plain.body as Buffer)).not.toContain('acceptance record');
    const other = await otherClientOf(t, p);
    expect((await other.agent.get(url)).status).toBe(404);
  });
});
