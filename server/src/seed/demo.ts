import { randomUUID } from 'node:crypto';
import { defaultEstimatingSettings } from '@layerbook/contracts';
import {
  auditLog,
  clients,
  eq,
  firmEstimatingSettings,
  firms,
  memberships,
  portalUsers,
  sites,
  users,
  withGlobal,
  withTenant,
} from '@layerbook/db';
import { usFederalHolidaysAhead } from '@layerbook/domain';
import { localDate } from '../firms/local-date';
import { type DemoHistory, seedDemoBilling } from './demo-billing';
import { seedDemoInquiries } from './demo-inquiries';
import { seedDemoLibrary } from './demo-library';
import { seedDemoSamples } from './demo-samples';
import { seedDemoTakeoff } from './demo-takeoff';
import { Pool } from 'pg';
import { hashPassword } from '../auth/passwords';

/**
 * The demo firm: an invented decorative-plaster studio in invented towns (Marrowby, Ebbsfold,
 * Sallowby). Every name, address and figure here is made up. Seeded once; running again changes nothing.
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
    // A crew member who reads Layerbook in Spanish (the firm's own language stays English).
    { role: 'crew', name: 'Lucía Ferrand', email: 'lucia@fernhollow.example', language: 'es' },
  ],
  client: { name: 'Hattie Brambleton', email: 'hattie@brambleton.example' },
} as const;

/**
 * The demo firm, once. With the owner's pool (`npm start`'s seed), the audit log's rows of the billing
 * story are dated at their moments of it (the web role may only append to the log), so a job's
 * history reads "issued 72 days ago", not everything at the moment of seeding.
 */
export async function seedDemo(pool: Pool, now: Date = new Date(), ownerPool?: Pool): Promise<'created' | 'present'> {
  const existing = await withGlobal(
    pool,
    async (tx) => (await tx.db.select({ id: users.id }).from(users).where(eq(users.email, DEMO.people[0].email)))[0],
  );
  if (existing) return 'present';
  const passwordHash = await hashPassword(DEMO.password);
  const firmId = randomUUID();
  const people = await withTenant(pool, firmId, async (tx) => {
    await tx.db.insert(firms).values({ id: firmId, ...DEMO.firm });
    // A US firm: its days off are the federal holidays of the coming year (5 U.S.C. 6103(a), as observed).
    const today = localDate(DEMO.firm.timeZone, now);
    const settings = defaultEstimatingSettings('imperial');
    await tx.db
      .insert(firmEstimatingSettings)
      .values({ tenantId: firmId, settings: { ...settings, calendar: { ...settings.calendar, holidays: usFederalHolidaysAhead(today) } } });
    const userIds: string[] = [];
    for (const person of DEMO.people) {
      const [user] = await tx.db.insert(users).values({ email: person.email, name: person.name, passwordHash }).returning({ id: users.id });
      await tx.db
        .insert(memberships)
        .values({ tenantId: firmId, userId: user.id, role: person.role, language: 'language' in person ? person.language : null });
      userIds.push(user.id);
    }
    const [client] = await tx.db
      .insert(clients)
      .values({ tenantId: firmId, kind: 'homeowner', name: DEMO.client.name, email: DEMO.client.email, phone: '555-0177' })
      .returning({ id: clients.id });
    const [site] = await tx.db
      .insert(sites)
      .values({
        tenantId: firmId,
        clientId: client.id,
        label: 'Home',
        addressLine1: '24 Thistledown Lane',
        city: 'Marrowby',
        region: 'VT',
        postalCode: '05999',
        yearBuilt: 1924,
        accessNotes: 'Stair hall ceiling 17 ft; round sitting room with a turret ceiling',
      })
      .returning({ id: sites.id });
    const [portalUser] = await tx.db
      .insert(portalUsers)
      .values({ tenantId: firmId, clientId: client.id, email: DEMO.client.email, name: DEMO.client.name })
      .returning({ id: portalUsers.id });
    await seedDemoInquiries(tx, today, userIds[0]);
    const library = await seedDemoLibrary(tx);
    await seedDemoTakeoff(tx, site.id);
    await seedDemoSamples(tx, { clientId: client.id, siteId: site.id, officeId: userIds[1], portalUserId: portalUser.id, library, now });
    await tx.db.insert(auditLog).values({ tenantId: firmId, actorKind: 'system', action: 'demo.seeded', entity: 'firm', entityId: firmId });
    return { ownerId: userIds[0], officeId: userIds[1], crewId: userIds[2], clientId: client.id, siteId: site.id };
  });
  // Billing comes after, step by step (each in its own transaction), as the office and the client would do it.
  const history = await seedDemoBilling(pool, firmId, people, now);
  if (ownerPool) await dateDemoHistory(ownerPool, firmId, history);
  return 'created';
}

/**
 * Dates the rows each seeding transaction wrote to the append-only history (the audit log, the job's
 * progress marks; created_at is the transaction's start) at the moment of the story it stands for.
 */
export async function dateDemoHistory(ownerPool: Pool, firmId: string, history: DemoHistory): Promise<void> {
  await withTenant(ownerPool, firmId, async (tx) => {
    for (const table of ['audit_log', 'job_progress'] as const) {
      await tx.client.query(
        `update ${table} a set created_at = h.at
           from unnest($2::timestamptz[], $3::timestamptz[]) as h(tx_start, at)
          where a.tenant_id = $1 and a.created_at = h.tx_start`,
        [firmId, history.map((h) => h.txStart), history.map((h) => h.at.toISOString())],
      );
    }
  });
}
