import type { ClientSummary, EstimateInputs, EstimateView, EstimatingSettingsView, FirmSettings, SiteView } from '@layerbook/contracts';
import { withTenant } from '@layerbook/db';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, TestServer, uniqueEmail } from '../testing/harness';

/** What an `insert … returning id` answers. */
interface IdRow {
  id: string;
}

/**
 * Test set-up for the proposal specs (no spec of its own): a firm with an address and 8.25 % tax
 * on the whole job, a client with an e-mail, the round dining room of DOMAIN.md §2.2 and a
 * two-layer lime system (primer, then lime plaster, which triggers the lime caution).
 * Rates are illustrative: common practice, no source.
 */
export async function firmWithPricedEstimate(t: TestServer, name: string, opts: { clientEmail?: string; save?: boolean } = {}) {
  const o = await signUpFirm(t.app, name);
  const csrf = () => o.csrf();
  const firm = (await o.agent.get('/api/firm')).body as FirmSettings;
  const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = firm;
  await o.agent
    .patch('/api/firm')
    .set('x-csrf-token', csrf())
    .send({ ...profile, addressLine1: '12 Kiln Lane', city: 'Ochreford', region: 'VT', postalCode: '05999', phone: '+1 802 555 0142' });
  const estimating = ((await o.agent.get('/api/firm/estimating')).body as EstimatingSettingsView).settings;
  await o.agent
    .put('/api/firm/estimating')
    .set('x-csrf-token', csrf())
    .send({ ...estimating, tax: { mode: 'wholeJob', ratePercent: 8.25 } });

  const clientEmail = opts.clientEmail ?? uniqueEmail('client');
  const client = (
    await o.agent.post('/api/clients').set('x-csrf-token', csrf()).send({ kind: 'homeowner', name: 'Edwina Marl', email: clientEmail })
  ).body as ClientSummary;
  const site = (
    await o.agent
      .post(`/api/clients/${client.id}/sites`)
      .set('x-csrf-token', csrf())
      .send({ addressLine1: '1 Round Row', city: 'Ochreford', yearBuilt: 1990 })
  ).body as SiteView;
  const ids = await withTenant(t.ctx.pool, o.firmId, async (tx) => {
    const room = await tx.client.query<IdRow>(`insert into rooms (tenant_id, site_id, name) values ($1, $2, 'Dining room') returning id`, [
      tx.tenantId,
      site.id,
    ]);
    const walls = {
      kind: 'roundWalls',
      radius: 9,
      height: 10,
      openings: [
        { width: 3, height: 7 },
        { width: 4, height: 5, count: 2 },
      ],
    };
    const surface = await tx.client.query<IdRow>(
      `insert into surfaces (tenant_id, room_id, name, shape, length_unit) values ($1, $2, 'Walls', $3, 'ft') returning id`,
      [tx.tenantId, room.rows[0].id, walls],
    );
    const primer = await tx.client.query<IdRow>(
      `insert into products (tenant_id, name, kind, unit, containers) values ($1, 'Acrylic primer', 'primer', 'gallon', $2) returning id`,
      [tx.tenantId, JSON.stringify([{ label: 'Gallon', size: 1, unit: 'gallon', price: '45.00' }])],
    );
    const lime = await tx.client.query<IdRow>(
      `insert into products (tenant_id, name, kind, unit, containers, hazards) values ($1, 'Lime putty plaster', 'lime', 'kg', $2, '{"isLime":true}') returning id`,
      [tx.tenantId, JSON.stringify([{ label: '20 kg pail', size: 20, unit: 'kg', price: '95.00' }])],
    );
    const primeLayer = {
      id: 'prime',
      name: 'Primer',
      method: 'roll',
      productId: primer.rows[0].id,
      coverage: { kind: 'spreadRate', surfacePerUnit: 350, unit: 'gallon', lengthUnit: 'ft' },
      coats: 1,
      waste: 0.1,
      productionRate: { surfacePerHour: 250, lengthUnit: 'ft' },
      waitHoursAfter: 4,
    };
    const limeLayer = {
      id: 'lime',
      name: 'Lime plaster',
      method: 'trowel',
      productId: lime.rows[0].id,
      coverage: { kind: 'consumption', unitPerSurface: 0.15, unit: 'kg', lengthUnit: 'ft' },
      coats: 2,
      waste: 0.1,
      productionRate: { surfacePerHour: 60, lengthUnit: 'ft' },
      waitHoursAfter: 24,
    };
    const system = await tx.client.query<IdRow>(
      `insert into finish_systems (tenant_id, name, layers) values ($1, 'Polished lime plaster', $2) returning id`,
      [tx.tenantId, JSON.stringify([primeLayer, limeLayer])],
    );
    const simple = await tx.client.query<IdRow>(
      `insert into finish_systems (tenant_id, name, layers) values ($1, 'Primed walls', $2) returning id`,
      [tx.tenantId, JSON.stringify([primeLayer])],
    );
    return { surfaceId: surface.rows[0].id, systemId: system.rows[0].id, simpleId: simple.rows[0].id };
  });
  const estimate = (
    await o.agent
      .post('/api/estimates')
      .set('x-csrf-token', csrf())
      .send({ siteId: site.id, title: 'Dining room plaster', startDate: '2026-12-07' })
  ).body as EstimateView;
  const inputs: EstimateInputs = {
    title: 'Dining room plaster',
    startDate: '2026-12-07',
    isOccupied: false,
    variants: [
      { id: 'A', label: 'Polished lime', surfaces: [{ surfaceId: ids.surfaceId, finishSystemId: ids.systemId }] },
      { id: 'B', label: 'Primed only', surfaces: [{ surfaceId: ids.surfaceId, finishSystemId: ids.simpleId }] },
    ],
    addOns: [{ id: 'stencil', label: 'Stencilled border', labourHours: 6, materialsCost: '40.00' }],
    equipment: [],
    subcontracts: [],
    sundries: [{ label: 'Masking and protection', amount: '35.00' }],
    discount: null,
    perAreaRates: {},
  };
  if (opts.save !== false) {
    const saved = await o.agent.put(`/api/estimates/${estimate.id}/inputs`).set('x-csrf-token', csrf()).send(inputs);
    if (saved.status !== 200) throw new Error(`estimate not saved: ${saved.status} ${JSON.stringify(saved.body)}`);
  }
  return { ...o, clientId: client.id, clientEmail, estimateId: estimate.id, ...ids };
}

export async function joinAs(t: TestServer, owner: Awaited<ReturnType<typeof signUpFirm>>, role: 'crew' | 'office') {
  const email = uniqueEmail(role);
  await owner.agent.post('/api/team/invitations').set('x-csrf-token', owner.csrf()).send({ email, role });
  const token = new URL(linkIn(await t.inbox.waitFor((m) => JSON.stringify(m.to).includes(email)))).searchParams.get('token')!;
  const member = await newAgent(t.app);
  await member.agent
    .post('/api/auth/invitations/accept')
    .set('x-csrf-token', member.csrf())
    .send({ token, name: `A ${role}`, password: 'member-password-2026' });
  await member.refresh();
  return member;
}
