import type { EstimateView } from '@layerbook/contracts';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { makeAndSend, signInByLink } from './portal-fixtures';
import { pdfText } from './pdf/pdf-text';
import { firmWithPricedEstimate } from './proposal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

const INTERNAL = 'Price the scaffold rental from the yard on Mill Road; the client haggles.';
const FOR_CLIENT = 'We cover the floors and furniture every day.';

describe('internal notes stay with the office; notes for the client reach the proposal', () => {
  it('saves both, and only the client notes reach the snapshot, the portal and the PDF', async () => {
    const f = await firmWithPricedEstimate(t, 'Two Notes Plaster');
    const view = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
    const saved = await f.agent
      .put(`/api/estimates/${f.estimateId}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send({ ...view.inputs, internalNotes: INTERNAL, clientNotes: FOR_CLIENT });
    expect(saved.status).toBe(200);
    expect((saved.body as EstimateView).inputs).toMatchObject({ internalNotes: INTERNAL, clientNotes: FOR_CLIENT });

    const sent = await makeAndSend(t, f);
    expect(sent.snapshot.notes).toBe(FOR_CLIENT);
    expect(JSON.stringify(sent.snapshot)).not.toContain('Mill Road');
    expect(JSON.stringify(sent.snapshot)).not.toContain('Price the scaffold rental');

    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, sent.link);
    const read = await client.agent.get(`/api/portal/proposals/${sent.id}`);
    expect(read.body.snapshot.notes).toBe(FOR_CLIENT);
    expect(JSON.stringify(read.body)).not.toContain('Mill Road');

    const pdf = await client.agent
      .get(`/api/portal/proposals/${sent.id}/pdf`)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    const text = pdfText(pdf.body as Buffer).replace(/\s+/g, ' ');
    expect(text).toContain(FOR_CLIENT);
    expect(text).not.toContain('Mill Road');
  });

  it('names a note that is too long', async () => {
    const f = await firmWithPricedEstimate(t, 'Long Notes Washes');
    const view = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
    const res = await f.agent
      .put(`/api/estimates/${f.estimateId}/inputs`)
      .set('x-csrf-token', f.csrf())
      .send({ ...view.inputs, internalNotes: 'x'.repeat(4001) });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ field: 'internalNotes', message: 'Use at most 4000 characters.' }]);
  });
});
