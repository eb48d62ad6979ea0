import type { FirmSettings } from '@layerbook/contracts';
import type { Test } from 'supertest';

/** A signed-in staff agent, as the harness and the fixtures hand them out. */
interface Staff {
  readonly agent: { get(url: string): Test; patch(url: string): Test };
  csrf(): string;
}

/** PATCH /api/firm with the firm's current profile and `change` on top (the route takes the whole profile). */
export async function patchFirm(o: Staff, change: Partial<FirmSettings>): Promise<Awaited<Test>> {
  const { id: _id, slug: _slug, updatedAt: _u, logoUrl: _logo, ...profile } = (await o.agent.get('/api/firm')).body as FirmSettings;
  return o.agent
    .patch('/api/firm')
    .set('x-csrf-token', o.csrf())
    .send({ ...profile, ...change });
}
