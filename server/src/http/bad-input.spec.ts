import { encodeCursor } from '../inquiries/cursor';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';

let t: TestServer;
beforeAll(async () => {
  t = await startTestServer();
});
afterAll(() => t.stop());

type Owner = Awaited<ReturnType<typeof signUpFirm>>;
type Answer = { status: number; headers: Record<string, string>; body: { errors?: Array<{ field: string; message: string }> } };

function expectRefused(res: Answer, field: string, message?: RegExp) {
  expect(res.status).toBe(400);
  expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  expect(res.body.errors).toEqual([{ field, message: message ? expect.stringMatching(message) : expect.any(String) }]);
}

async function made(o: Owner) {
  const post = (path: string, body: object) => o.agent.post(path).set('x-csrf-token', o.csrf()).send(body);
  const client = (await post('/api/clients', { kind: 'homeowner', name: 'Perpetua Vane' })).body as { id: string };
  const site = (await post(`/api/clients/${client.id}/sites`, { addressLine1: '4 Tannery Row', city: 'Hobb' })).body as { id: string };
  const room = (await post(`/api/takeoff/sites/${site.id}/rooms`, { name: 'Parlour' })).body as { id: string };
  const inquiry = (await post('/api/inquiries', { contactName: 'Perpetua Vane', source: 'phone' })).body as { id: string };
  return { client: client.id, site: site.id, room: room.id, inquiry: inquiry.id };
}

describe('odd input answers 400 naming the field, never 500', () => {
  it('refuses an empty PATCH alike on every route that edits a record', async () => {
    const o = await signUpFirm(t.app);
    const ids = await made(o);
    for (const path of [
      `/api/sites/${ids.site}`,
      `/api/clients/${ids.client}`,
      `/api/takeoff/rooms/${ids.room}`,
      `/api/inquiries/${ids.inquiry}`,
    ]) {
      const res = await o.agent.patch(path).set('x-csrf-token', o.csrf()).send({});
      expectRefused(res, '(body)', /^Nothing to change/);
    }
    // Still 403 before 400: without its CSRF token an empty PATCH is refused before it is read.
    expect((await o.agent.patch(`/api/sites/${ids.site}`).send({})).status).toBe(403);
  });

  it('refuses the year 0000 and other out-of-range dates, naming the field', async () => {
    const o = await signUpFirm(t.app);
    const { inquiry } = await made(o);
    for (const nextFollowUp of ['0000-01-01', '0026-04-01', '9999-12-31']) {
      const res = await o.agent.patch(`/api/inquiries/${inquiry}`).set('x-csrf-token', o.csrf()).send({ nextFollowUp });
      expectRefused(res, 'nextFollowUp', /between 1900 and 2999/);
    }
    const fine = await o.agent.patch(`/api/inquiries/${inquiry}`).set('x-csrf-token', o.csrf()).send({ nextFollowUp: '2027-01-04' });
    expect(fine.status).toBe(200);
  });

  const id = '0b7e5f5e-7f5c-4b8e-9d43-7c1a3b0e2f11';
  it.each([
    ['not base64 JSON', 'garbage'],
    ['a sort value that is no timestamp', encodeCursor('garbage', id)],
    ['the year 0000', encodeCursor('0000-01-01 00:00:00+00', id)],
    ['a month 13', encodeCursor('2026-13-01 10:00:00.5+00', id)],
    ['an id of 36 dashes', encodeCursor('2026-12-01 10:00:00+00', '-'.repeat(36))],
    ['a null sort value', encodeCursor(null, id)],
  ])('refuses a tampered list cursor (%s) on every keyset list, naming `after`', async (_what, after) => {
    const o = await signUpFirm(t.app);
    for (const path of ['/api/inquiries', '/api/inquiries?sort=value', '/api/inquiries?sort=follow_up', '/api/clients', '/api/estimates']) {
      const res = await o.agent.get(path).query({ after });
      expectRefused(res, 'after', /page link is not valid/);
    }
  });

  it('still pages with the cursors it wrote, in every sort', async () => {
    const o = await signUpFirm(t.app);
    for (const name of ['One', 'Two', 'Three']) {
      await o.agent
        .post('/api/inquiries')
        .set('x-csrf-token', o.csrf())
        .send({ contactName: name, source: 'phone', estimatedValue: '100.50' });
    }
    for (const sort of ['newest', 'oldest', 'value', 'follow_up']) {
      const first = await o.agent.get('/api/inquiries').query({ sort, limit: 2 });
      expect(first.body.nextCursor).toEqual(expect.any(String));
      const next = await o.agent.get('/api/inquiries').query({ sort, limit: 2, after: first.body.nextCursor });
      expect({ sort, status: next.status, count: next.body.items.length }).toEqual({ sort, status: 200, count: 1 });
    }
  });
});
