import { INQUIRY_SORTS, type InquiryListQuery } from '@layerbook/contracts';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { buildListQuery } from './list';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

const query = (q: string): InquiryListQuery => ({ q, sort: INQUIRY_SORTS[0], limit: 25 });

describe('inquiry search by phone', () => {
  it('finds a number however it was typed: the same digits match', async () => {
    const o = await signUpFirm(t.app, 'Phone Search Inquiry Plaster');
    const inq = await o.agent
      .post('/api/inquiries')
      .set('x-csrf-token', o.csrf())
      .send({ contactName: 'Barnaby Lisle', source: 'phone', phone: '555.010.0199' });
    expect(inq.status).toBe(201);
    for (const q of ['555 010 0199', '(555) 010-0199', '5550100199', '010-0199', '555.010']) {
      const found = await o.agent.get('/api/inquiries').query({ q });
      expect([q, found.body.items.map((i: { id: string }) => i.id)]).toEqual([q, [inq.body.id]]);
    }
    expect((await o.agent.get('/api/inquiries').query({ q: '555 010 0198' })).body.items).toEqual([]);
  });

  it.each([
    ['a name', 'Lisle', false],
    ['too few digits to be a phone number', '010 01', false],
    ['an address with a number in it', '12 Kiln Row 5550100', false],
    ['a phone number', '+1 (555) 010-0199', true],
  ])('compares digits only for a search shaped like a phone number: %s', (_case, q, compares) => {
    expect(buildListQuery('tenant', query(q)).text.includes('regexp_replace')).toBe(compares);
  });
});
