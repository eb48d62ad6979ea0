import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;

/** Makes an inquiry and books a visit, which files its client and site by themselves. */
async function fileInquiry(o: Owner, siteAddress: string): Promise<string> {
  const made = await o.agent
    .post('/api/inquiries')
    .set('x-csrf-token', o.csrf())
    .send({ contactName: 'Maple Dunning', source: 'phone', siteAddress });
  expect(made.status).toBe(201);
  const moved = await o.agent.post(`/api/inquiries/${made.body.id}/stage`).set('x-csrf-token', o.csrf()).send({ stage: 'visit_booked' });
  expect(moved.status).toBe(200);
  return moved.body.clientId as string;
}

describe('the site filed from an inquiry', () => {
  it('is in the firm’s own country, not always the US', async () => {
    const o = await signUpFirm(t.app, 'Country Plaster');
    const {
      id: _id,
      slug: _slug,
      updatedAt: _u,
      logoUrl: _l,
      ...settings
    } = (await o.agent.get('/api/firm')).body as Record<string, unknown>;
    const saved = await o.agent
      .patch('/api/firm')
      .set('x-csrf-token', o.csrf())
      .send({ ...settings, country: 'CA' });
    expect(saved.status).toBe(200);
    const clientId = await fileInquiry(o, '12 Rideau Terrace, Ottawa');
    const client = await o.agent.get(`/api/clients/${clientId}`);
    expect(client.body.sites.map((s: { country: string }) => s.country)).toEqual(['CA']);
  });

  it('can be saved again from the site form whatever address length the inquiry allowed (the limits agree)', async () => {
    const o = await signUpFirm(t.app, 'Long Address Plaster');
    // 300 characters is what an inquiry's siteAddress allows, and the whole of it becomes the site's first line.
    const address = `Unit 4B, The Old Granary Courtyard, ${'Long Meadow Lane '.repeat(17)}`.slice(0, 300);
    expect(address).toHaveLength(300);
    const clientId = await fileInquiry(o, address);
    const site = (await o.agent.get(`/api/clients/${clientId}`)).body.sites[0];
    expect(site.addressLine1).toBe(address);
    // The site form (site-form.ts toBody) sends every field back; the office only adds a gate code.
    const { id: _id, clientId: _c, isPre1978: _p, ...fields } = site;
    const saved = await o.agent
      .patch(`/api/sites/${site.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ ...fields, accessNotes: 'Gate code 1234' });
    expect([saved.status, saved.body.errors]).toEqual([200, undefined]);
    const longer = await o.agent
      .patch(`/api/sites/${site.id}`)
      .set('x-csrf-token', o.csrf())
      .send({ addressLine1: `${address}x` });
    expect([longer.status, longer.body.errors?.[0]?.field]).toEqual([400, 'addressLine1']);
  });
});
