import type { EstimateView, ProposalVersionView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { ASK_FOR_YEAR, leadNotice, OUTSIDE_US_LINE } from '@layerbook/domain';
import { newAgent, startTestServer, TestServer } from '../testing/harness';
import { makeAndSend, signInByLink } from './portal-fixtures';
import { pdfText } from './pdf/pdf-text';
import { renderProposalPdf } from './pdf/render-proposal';
import { firmWithPricedEstimate } from './proposal-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
  t.setNow(new Date('2026-12-01T15:00:00Z'));
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof firmWithPricedEstimate>>;

/** Sets the site's year and the walls' disturbed painted area, then saves the estimate again so the engine recomputes. */
async function siteFacts(f: Firm, yearBuilt: number | null, disturbedFt2: number | null): Promise<EstimateView> {
  await withTenant(t.ctx.pool, f.firmId, async (tx) => {
    await tx.client.query(`update sites set year_built = $2 where tenant_id = $1 and id = (select site_id from estimates where id = $3)`, [
      tx.tenantId,
      yearBuilt,
      f.estimateId,
    ]);
    await tx.client.query(`update surfaces set disturbed_painted_area = $3 where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      f.surfaceId,
      disturbedFt2,
    ]);
  });
  const view = (await f.agent.get(`/api/estimates/${f.estimateId}`)).body as EstimateView;
  const saved = await f.agent.put(`/api/estimates/${f.estimateId}/inputs`).set('x-csrf-token', f.csrf()).send(view.inputs);
  expect(saved.status).toBe(200);
  return saved.body as EstimateView;
}

async function pdfOf(f: Firm, id: string): Promise<string> {
  const res = await f.agent
    .get(`/api/proposals/${id}/pdf`)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
  return pdfText(res.body as Buffer).replace(/\s+/g, ' ');
}

describe('the lead-safe notice on a proposal (40 CFR 745; target housing, 15 U.S.C. 2681(17))', () => {
  it('a pre-1978 home carries it in the snapshot, the portal and the PDF, even with no paint disturbed', async () => {
    const f = await firmWithPricedEstimate(t, 'Old House Stucco');
    await siteFacts(f, 1950, null);
    const sent = await makeAndSend(t, f);
    expect(sent.snapshot.leadNotice).toEqual(leadNotice('target-housing'));
    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, sent.link);
    const read = await client.agent.get(`/api/portal/proposals/${sent.id}`);
    expect(read.body.snapshot.leadNotice.title).toBe('Lead-safe work in a home built before 1978');
    const text = await pdfOf(f, sent.id);
    expect(text).toContain('Lead-safe work in a home built before 1978');
    expect(text).toContain('This home was built before 1978');
  });

  it('an unknown year with paint disturbed asks for the year and is treated as pre-1978 until told', async () => {
    const f = await firmWithPricedEstimate(t, 'Unknown Year Washes');
    const saved = await siteFacts(f, null, 40);
    const optionA = saved.result!.variants.find((v) => v.id === 'A')!.result;
    expect(optionA.lead).toBe('assumed-target-housing');
    expect(optionA.cautions.find((c) => c.id === 'lead-safe-work')?.bullets[0]).toBe(ASK_FOR_YEAR);
    const made = (
      await f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-31' })
    ).body as ProposalVersionView;
    expect(made.snapshot.leadNotice).toEqual(leadNotice('assumed-target-housing'));
    expect(made.snapshot.leadNotice?.bullets[0]).toContain('please tell us the year');
  });

  it('a home built in 1978 or later, or of unknown year with nothing disturbed, has none', async () => {
    const f = await firmWithPricedEstimate(t, 'Newer Home Glazing');
    const made = (
      await f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-31' })
    ).body as ProposalVersionView;
    expect(made.snapshot.leadNotice).toBeNull();
    await siteFacts(f, null, null);
    const again = (
      await f.agent.post('/api/proposals').set('x-csrf-token', f.csrf()).send({ estimateId: f.estimateId, expiresOn: '2026-12-31' })
    ).body as ProposalVersionView;
    expect(again.snapshot.leadNotice).toBeNull();
  });
});

describe('each caution says whose rule it is, in the snapshot, the portal and the PDF', () => {
  it('a firm outside the US: "A US federal rule." with the line to check its own rules, on every caution and the lead notice', async () => {
    const f = await firmWithPricedEstimate(t, 'Maple Lime Works');
    await withTenant(t.ctx.pool, f.firmId, (tx) => tx.client.query(`update firms set country = 'CA' where id = $1`, [tx.tenantId]));
    await siteFacts(f, 1950, 40);
    const sent = await makeAndSend(t, f);
    const cautions = sent.snapshot.safety.cautions;
    const lead = cautions.find((c) => c.id === 'lead-safe-work');
    expect(lead?.jurisdiction).toBe(`A US federal rule. ${OUTSIDE_US_LINE}`);
    for (const c of cautions) expect(c.jurisdiction).toMatch(/^(A US federal rule\.|Guidance, not a regulation\.) Outside the US, check/);
    expect(sent.snapshot.leadNotice?.jurisdiction).toBe(`A US federal rule. ${OUTSIDE_US_LINE}`);

    const client = await newAgent(t.app, 'portal');
    await signInByLink(client, sent.link);
    const read = await client.agent.get(`/api/portal/proposals/${sent.id}`);
    expect(read.body.snapshot.safety.cautions.map((c: { jurisdiction?: string }) => c.jurisdiction)).toEqual(
      cautions.map((c) => c.jurisdiction),
    );
    const text = await pdfOf(f, sent.id);
    // once under the lead notice and once under each caution
    expect(text.split('check your national or provincial rules').length - 1).toBe(cautions.length + 1);
    expect(text).toContain('A US federal rule.');
  });

  it('a US firm: the rule is said to be US federal, with no outside-US line', async () => {
    const f = await firmWithPricedEstimate(t, 'Home Lime Works');
    await siteFacts(f, 1950, 40);
    const sent = await makeAndSend(t, f);
    expect(sent.snapshot.safety.cautions.find((c) => c.id === 'lead-safe-work')?.jurisdiction).toBe('A US federal rule.');
    expect(sent.snapshot.leadNotice?.jurisdiction).toBe('A US federal rule.');
    const text = await pdfOf(f, sent.id);
    expect(text).toContain('A US federal rule.');
    expect(text).not.toContain('provincial');
  });

  it('a snapshot made before cautions said so still renders, without the line', async () => {
    const f = await firmWithPricedEstimate(t, 'Old Snapshot Lime');
    await siteFacts(f, 1950, 40);
    const sent = await makeAndSend(t, f);
    const old = {
      ...sent.snapshot,
      safety: { ...sent.snapshot.safety, cautions: sent.snapshot.safety.cautions.map(({ jurisdiction: _j, ...c }) => c) },
      leadNotice: sent.snapshot.leadNotice ? { ...sent.snapshot.leadNotice, jurisdiction: undefined } : null,
    };
    const text = pdfText(await renderProposalPdf(old, { version: 1, snapshotHash: 'a'.repeat(64) })).replace(/\s+/g, ' ');
    expect(text).toContain('Lead-safe work');
    expect(text).not.toContain('A US federal rule.');
  });
});
