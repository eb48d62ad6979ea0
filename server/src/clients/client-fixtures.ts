import type { Test } from 'supertest';

interface Staff {
  readonly agent: { post(url: string): Test };
  csrf(): string;
}

/** A homeowner client made through the API (201 expected): its id. */
export async function addClient(o: Staff, body: Record<string, unknown>): Promise<string> {
  const res = await o.agent
    .post('/api/clients')
    .set('x-csrf-token', o.csrf())
    .send({ kind: 'homeowner', ...body });
  expect(res.status).toBe(201);
  return (res.body as { id: string }).id;
}
