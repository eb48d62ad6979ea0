import { DEFAULT_BILLING_SETTINGS, defaultEstimatingSettings, type EstimatingSettingsView } from '@layerbook/contracts';
import { addProduct, PRIMER } from '../library/library-fixtures';
import { signUpFirm, startTestServer, type TestServer } from '../testing/harness';
import { patchFirm } from '../testing/firm-settings';

/* A change of currency leaves no stored amount that its own save would refuse in the new one. */

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Firm = Awaited<ReturnType<typeof signUpFirm>>;

const putEstimating = (o: Firm, labourRate: string) =>
  o.agent
    .put('/api/firm/estimating')
    .set('x-csrf-token', o.csrf())
    .send({ ...defaultEstimatingSettings('imperial'), labourRate });

describe('changing the currency with amounts finer than the new one', () => {
  it('refuses (409 naming currency) while the labour rate has cents, changing nothing; takes it once the rate is whole', async () => {
    const o = await signUpFirm(t.app, 'Yen Switch Plaster');
    expect((await putEstimating(o, '55.50')).status).toBe(200);
    const refused = await patchFirm(o, { currency: 'JPY', name: 'Renamed Plaster' });
    const message = 'The labour rate in the estimating settings is 55.50. Use whole amounts in JPY. Change it first, then the currency.';
    expect([refused.status, refused.body.errors]).toEqual([409, [{ field: 'currency', message }]]);
    expect((await o.agent.get('/api/firm')).body).toMatchObject({ currency: 'USD', name: 'Yen Switch Plaster' });

    expect((await putEstimating(o, '56.00')).status).toBe(200);
    expect((await patchFirm(o, { currency: 'JPY' })).status).toBe(200);
    // what was stored still passes its own save in yen
    const view = (await o.agent.get('/api/firm/estimating')).body as EstimatingSettingsView;
    expect((await o.agent.put('/api/firm/estimating').set('x-csrf-token', o.csrf()).send(view.settings)).status).toBe(200);
  });

  it('names a deposit limit with cents in the billing settings', async () => {
    const o = await signUpFirm(t.app, 'Yen Deposit Plaster');
    const saved = await o.agent
      .put('/api/firm/billing')
      .set('x-csrf-token', o.csrf())
      .send({
        ...DEFAULT_BILLING_SETTINGS,
        depositCap: { kind: 'lesserOf', amount: '1000.50', percent: 10 },
        depositCapName: 'Deposit limit',
      });
    expect(saved.status).toBe(200);
    const refused = await patchFirm(o, { currency: 'JPY' });
    expect([refused.status, refused.body.errors?.[0]?.message]).toEqual([
      409,
      'The deposit limit in the billing settings is 1000.50. Use whole amounts in JPY. Change it first, then the currency.',
    ]);
    expect((await o.agent.get('/api/firm')).body.currency).toBe('USD');
  });

  it('names a product container priced with cents, archived ones too', async () => {
    const o = await signUpFirm(t.app, 'Yen Library Plaster');
    await addProduct(o, { ...PRIMER, containers: [{ label: '1 gal', size: 1, unit: 'gallon', price: '45.00' }] });
    const glaze = await addProduct(o, {
      ...PRIMER,
      name: 'Oil glaze',
      kind: 'glaze',
      containers: [{ label: '1 qt', size: 1, unit: 'quart', price: '18.25' }],
    });
    expect((await o.agent.post(`/api/library/products/${glaze}/archive`).set('x-csrf-token', o.csrf())).status).toBe(200);
    const refused = await patchFirm(o, { currency: 'JPY' });
    expect([refused.status, refused.body.errors?.[0]?.message]).toEqual([
      409,
      'The price of the 1 qt container of "Oil glaze" (archived) in the finish library is 18.25. Use whole amounts in JPY. Change it first, then the currency.',
    ]);
    // a currency with cents takes it as it is
    expect((await patchFirm(o, { currency: 'EUR' })).status).toBe(200);
  });
});
