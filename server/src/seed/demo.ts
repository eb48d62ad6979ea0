import { randomUUID } from 'node:crypto';
import { auditLog, eq, firms, memberships, portalUsers, users, withGlobal, withTenant } from '@layerbook/db';
import { Pool } from 'pg';
import { hashPassword } from '../auth/passwords';

/**
 * The demo firm: an invented decorative-plaster studio in an invented town. Every name here is
 * made up. Seeded once; running again changes nothing.
 */
export const DEMO = {
  firm: {
    name: 'Fernhollow Plaster & Glaze',
    slug: 'fernhollow',
    addressLine1: '7 Kiln Yard Lane',
    city: 'Marrowby',
    region: 'VT',
    postalCode: '05999',
    country: 'US',
    phone: '555-0142',
    timeZone: 'America/New_York',
  },
  password: 'limewash-demo-2026',
  people: [
    { role: 'owner', name: 'Wren Calloway', email: 'owner@fernhollow.example' },
    { role: 'office', name: 'Priya Ashdown', email: 'office@fernhollow.example' },
    { role: 'crew', name: 'Mateo Quill', email: 'crew@fernhollow.example' },
  ],
  client: { name: 'Hattie Brambleton', email: 'hattie@brambleton.example' },
} as const;

export async function seedDemo(pool: Pool): Promise<'created' | 'present'> {
  const existing = await withGlobal(pool, async (tx) => (await tx.db.select().from(users).where(eq(users.email, DEMO.people[0].email)))[0]);
  if (existing) return 'present';
  const passwordHash = await hashPassword(DEMO.password);
  const firmId = randomUUID();
  await withTenant(pool, firmId, async (tx) => {
    await tx.db.insert(firms).values({ id: firmId, ...DEMO.firm });
    for (const person of DEMO.people) {
      const [user] = await tx.db.insert(users).values({ email: person.email, name: person.name, passwordHash }).returning({ id: users.id });
      await tx.db.insert(memberships).values({ tenantId: firmId, userId: user!.id, role: person.role });
    }
    await tx.db.insert(portalUsers).values({ tenantId: firmId, email: DEMO.client.email, name: DEMO.client.name });
    await tx.db.insert(auditLog).values({ tenantId: firmId, actorKind: 'system', action: 'demo.seeded', entity: 'firm', entityId: firmId });
  });
  return 'created';
}
