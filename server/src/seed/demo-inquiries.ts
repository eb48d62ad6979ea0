import { clients, inquiries, inquiryActivities, sites, TenantTx } from '@layerbook/db';

type Stage = (typeof inquiries.$inferInsert)['stage'];
type Source = (typeof inquiries.$inferInsert)['source'];

/** Invented prospects at every stage, with follow-ups around `today` so the today page has work. */
const PROSPECTS: Array<{
  name: string;
  stage: Stage;
  source: Source;
  referrer?: string;
  value?: string;
  address: string;
  year: number | null;
  rooms: string;
  idea: string;
  followUpDays?: number;
  lost?: string;
}> = [
  {
    name: 'Tamsin Okonkwo-Reyes',
    stage: 'new',
    source: 'web_form',
    address: '18 Larchmere Close, Marrowby',
    year: 1931,
    rooms: 'Front hall walls and the stair ceiling',
    idea: 'Soft limewash, warm white',
    followUpDays: 0,
  },
  {
    name: 'Barnaby Quist',
    stage: 'new',
    source: 'phone',
    value: '4200.00',
    address: '5 Tannery Row, Ebbsfold',
    year: 2004,
    rooms: 'Powder room',
    idea: 'Metallic glaze over a deep base',
    followUpDays: 1,
  },
  {
    name: 'Harriet Penhallow',
    stage: 'contacted',
    source: 'designer_referral',
    referrer: 'Linnet & Vale Interiors',
    value: '18000.00',
    address: '2 Gorse Hill, Marrowby',
    year: 1908,
    rooms: 'Dining room walls and a shallow dome',
    idea: 'Polished lime plaster, pale stone',
    followUpDays: -3,
  },
  {
    name: 'Ozias Fenwick',
    stage: 'visit_booked',
    source: 'contractor_referral',
    referrer: 'Brackwater Builders',
    value: '9500.00',
    address: 'Unit 4, Millrace Yard, Ebbsfold',
    year: 1989,
    rooms: 'Reception wall, 40 ft run',
    idea: 'Troweled plaster with a burnished band',
    followUpDays: 2,
  },
  {
    name: 'Clementine Arbuthnot',
    stage: 'samples',
    source: 'past_client',
    value: '32000.00',
    address: '11 Heronsgate, Marrowby',
    year: 1962,
    rooms: 'Library: walls, coffered ceiling, beams',
    idea: 'Aged glaze over a warm ochre base',
    followUpDays: -1,
  },
  {
    name: 'Ignatius Blythe',
    stage: 'proposal_sent',
    source: 'showroom',
    value: '12750.00',
    address: '7 Wickham Lane, Sallowby',
    year: 1975,
    rooms: 'Turret room: round walls and a cone ceiling',
    idea: 'Venetian plaster in verdigris',
    followUpDays: 3,
  },
  {
    name: 'Rosamund Vetch',
    stage: 'won',
    source: 'designer_referral',
    referrer: 'Linnet & Vale Interiors',
    value: '21400.00',
    address: '3 Orchard Rise, Marrowby',
    year: 1999,
    rooms: 'Great room and gallery',
    idea: 'Marmorino, two tones',
  },
  {
    name: 'Cuthbert Nyland',
    stage: 'lost',
    source: 'web_form',
    value: '6000.00',
    address: '42 Brook Street, Ebbsfold',
    year: null,
    rooms: 'Kitchen walls',
    idea: 'Plain paint',
    lost: 'Chose plain paint from a general painter',
  },
];

const addDays = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

export async function seedDemoInquiries(tx: TenantTx, today: string, ownerUserId: string): Promise<void> {
  for (const p of PROSPECTS) {
    let clientId: string | null = null;
    let siteId: string | null = null;
    if (p.stage === 'visit_booked' || p.stage === 'samples' || p.stage === 'proposal_sent' || p.stage === 'won') {
      const [client] = await tx.db
        .insert(clients)
        .values({ tenantId: tx.tenantId, kind: 'homeowner', name: p.name, email: `${p.name.split(' ')[0].toLowerCase()}@example.test` })
        .returning({ id: clients.id });
      clientId = client.id;
      const [site] = await tx.db
        .insert(sites)
        .values({ tenantId: tx.tenantId, clientId, addressLine1: p.address, yearBuilt: p.year })
        .returning({ id: sites.id });
      siteId = site.id;
    }
    const [row] = await tx.db
      .insert(inquiries)
      .values({
        tenantId: tx.tenantId,
        contactName: p.name,
        email: `${p.name.split(' ')[0].toLowerCase()}@example.test`,
        siteAddress: p.address,
        yearBuilt: p.year,
        rooms: p.rooms,
        finishIdea: p.idea,
        source: p.source,
        referrerName: p.referrer ?? '',
        stage: p.stage,
        estimatedValue: p.value ?? null,
        assigneeUserId: p.stage === 'new' ? null : ownerUserId,
        nextFollowUp: p.followUpDays === undefined ? null : addDays(today, p.followUpDays),
        lostReason: p.lost ?? '',
        consentToContact: true,
        clientId,
        siteId,
      })
      .returning({ id: inquiries.id });
    await tx.db.insert(inquiryActivities).values({ tenantId: tx.tenantId, inquiryId: row.id, kind: 'created', data: { source: p.source } });
  }
}
