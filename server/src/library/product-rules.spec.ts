import type { ProductView } from '@layerbook/contracts';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { addProduct, type Firm, fields, PRIMER } from './library-fixtures';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

async function yenFirm(name: string): Promise<Firm> {
  const o = await signUpFirm(t.app, name);
  const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _l, ...profile } = (await o.agent.get('/api/firm')).body as Record<string, unknown>;
  const jpy = await o.agent
    .patch('/api/firm')
    .set('x-csrf-token', o.csrf())
    .send({ ...profile, currency: 'JPY' });
  expect(jpy.status).toBe(200);
  return o;
}

describe('container prices and the firm currency', () => {
  it('refuses a price with sen in a yen firm on create, naming the container, and stores nothing', async () => {
    const o = await yenFirm('Yen Price Studio');
    const res = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({
        ...PRIMER,
        containers: [
          { label: '1 gal', size: 1, unit: 'gallon', price: '4500' },
          { label: '1 qt', size: 1, unit: 'quart', price: '1600.50' },
        ],
      });
    expect([res.status, fields(res.body), res.body.errors[0].message]).toEqual([400, ['containers.1.price'], 'Use whole amounts in JPY.']);
    expect((await o.agent.get('/api/library/products')).body.items).toEqual([]);
  });

  it('refuses it on update too, and keeps the stored prices', async () => {
    const o = await yenFirm('Yen Update Studio');
    const id = await addProduct(o, { ...PRIMER, containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '4500' }] });
    const res = await o.agent
      .patch(`/api/library/products/${id}`)
      .set('x-csrf-token', o.csrf())
      .send({ containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '4500.50' }] });
    expect([res.status, fields(res.body)]).toEqual([400, ['containers.0.price']]);
    expect(((await o.agent.get(`/api/library/products/${id}`)).body as ProductView).containers.map((c) => c.price)).toEqual(['4500']);
  });

  it('takes cents in a dollar firm', async () => {
    const o = await signUpFirm(t.app, 'Dollar Price Studio');
    const res = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '45.50' }] });
    expect(res.status).toBe(201);
  });
});

describe('the lime kind and the lime flag', () => {
  const limeWash = {
    ...PRIMER,
    name: 'Lime wash',
    kind: 'lime' as const,
    unit: 'L' as const,
    containers: [{ label: '5 L', size: 5, unit: 'L' as const, price: '40.00' }],
    hazards: {},
  };

  it('a product of kind lime carries the flag that raises the alkali caution, ticked or not', async () => {
    const o = await signUpFirm(t.app, 'Lime Kind Studio');
    const res = await o.agent.post('/api/library/products').set('x-csrf-token', o.csrf()).send(limeWash);
    expect([res.status, (res.body as ProductView).hazards]).toEqual([201, { isLime: true }]);
  });

  it('keeps the flag when an update unticks it, and sets it when a product becomes lime', async () => {
    const o = await signUpFirm(t.app, 'Lime Update Studio');
    const wash = await addProduct(o, limeWash);
    const unticked = await o.agent
      .patch(`/api/library/products/${wash}`)
      .set('x-csrf-token', o.csrf())
      .send({ hazards: { isLime: false } });
    expect((unticked.body as ProductView).hazards.isLime).toBe(true);
    const primer = await addProduct(o, PRIMER);
    const relabelled = await o.agent.patch(`/api/library/products/${primer}`).set('x-csrf-token', o.csrf()).send({ kind: 'lime' });
    expect((relabelled.body as ProductView).hazards.isLime).toBe(true);
  });

  it('leaves other kinds as ticked', async () => {
    const o = await signUpFirm(t.app, 'Plaster Kind Studio');
    const res = await o.agent
      .post('/api/library/products')
      .set('x-csrf-token', o.csrf())
      .send({ ...PRIMER, kind: 'plaster' });
    expect((res.body as ProductView).hazards).toEqual({});
  });
});
