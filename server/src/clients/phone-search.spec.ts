import { phoneDigits, phoneSearchDigits } from './phone';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

describe('phone digits', () => {
  it.each([
    ['(555) 010-0199', '5550100199', '5550100199'],
    ['+1 555.010.0199', '15550100199', '15550100199'],
    ['010-01', '', ''],
    ['Unit 12, 5550100 Kiln Row', '125550100', ''],
  ])('%s: digits %s, searched as %s', (text, digits, searched) => {
    expect([phoneDigits(text), phoneSearchDigits(text)]).toEqual([digits, searched]);
  });
});

describe('client search by phone', () => {
  it('finds a client by the number as caller ID shows it, however it was typed', async () => {
    const o = await signUpFirm(t.app, 'Phone Search Plaster');
    const made = await o.agent
      .post('/api/clients')
      .set('x-csrf-token', o.csrf())
      .send({ kind: 'homeowner', name: 'Barnaby Lisle', phone: '(555) 010-0199' });
    expect(made.status).toBe(201);
    for (const q of ['5550100199', '555.010.0199', '010 0199', '(555) 010']) {
      const found = await o.agent.get('/api/clients').query({ q });
      expect([q, found.body.items.map((c: { id: string }) => c.id)]).toEqual([q, [made.body.id]]);
    }
    expect((await o.agent.get('/api/clients').query({ q: '555 010 0198' })).body.items).toEqual([]);
  });
});
