import type { FinishLayerInput, ProductInput, ProductView } from '@layerbook/contracts';
import { linkIn } from '../testing/inbox';
import { newAgent, signUpFirm, TestServer, uniqueEmail } from '../testing/harness';

/** Test helpers for the library specs (no spec of its own). Rates are illustrative: common practice, no source. */

export type Firm = Awaited<ReturnType<typeof signUpFirm>>;

export async function joinAs(t: TestServer, owner: Firm, role: 'crew' | 'office') {
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

export const PRIMER: ProductInput = {
  name: 'Acrylic primer',
  kind: 'primer',
  unit: 'gallon',
  containers: [
    { label: '1 gal', size: 1, unit: 'gallon', price: '45.00' },
    { label: '1 qt', size: 1, unit: 'quart', price: '16.00' },
  ],
  hazards: {},
  sdsUrl: '',
  notes: '',
};
export const LIME: ProductInput = {
  ...PRIMER,
  name: 'Lime putty plaster',
  kind: 'lime',
  unit: 'kg',
  hazards: { isLime: true },
  containers: [{ label: '20 kg pail', size: 20, unit: 'kg', price: '95.00' }],
};
export const MEDIUM: ProductInput = {
  ...PRIMER,
  name: 'Glazing medium',
  kind: 'medium',
  unit: 'quart',
  containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '22.00' }],
};
export const TINT: ProductInput = {
  ...PRIMER,
  name: 'Umber tint paint',
  kind: 'paint',
  unit: 'quart',
  containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '18.00' }],
};

export async function addProduct(firm: Firm, body: ProductInput): Promise<string> {
  const res = await firm.agent.post('/api/library/products').set('x-csrf-token', firm.csrf()).send(body);
  if (res.status !== 201) throw new Error(`product not made: ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as ProductView).id;
}

export const primerLayer = (productId: string): FinishLayerInput => ({
  id: 'primer',
  name: 'Primer',
  method: 'roll',
  productId,
  coverage: { kind: 'spreadRate', surfacePerUnit: 300, unit: 'gallon', lengthUnit: 'ft' },
  coats: 1,
  coverageShare: 1,
  waste: 0.1,
  productionRate: { surfacePerHour: 250, lengthUnit: 'ft' },
  waitHoursAfter: 4,
});

export const glazeLayer = (tintId: string, mediumId: string): FinishLayerInput => ({
  id: 'glaze',
  name: 'Antiquing glaze',
  method: 'glaze',
  recipe: {
    by: 'volume',
    baseProductId: tintId,
    components: [
      { productId: tintId, parts: 1 },
      { productId: mediumId, parts: 4 },
    ],
  },
  coverage: { kind: 'spreadRate', surfacePerUnit: 400, unit: 'gallon', lengthUnit: 'ft' },
  coats: 1,
  coverageShare: 0.3,
  dilution: { share: 0.1, convention: 'ofConcentrate' },
  waste: 0.15,
  productionRate: { surfacePerHour: 100, lengthUnit: 'ft' },
  multipliers: { ceiling: 1.5 },
  waitHoursAfter: 24,
});

export const fields = (body: { errors?: { field: string }[] }) => (body.errors ?? []).map((e) => e.field).sort();
