import type { PublicFirm } from '@layerbook/contracts';
import type { Express } from 'express';
import request from 'supertest';

/** A complete, valid public inquiry for firm `slug`, with a form stamp old enough to pass the fill-time check. */
export async function publicInquiryBody(app: Express, slug: string, overrides: Record<string, unknown> = {}) {
  const firm = await request(app).get(`/api/public/firms/${slug}`);
  return {
    name: 'Della Hawthorne',
    email: `della.${Date.now().toString(36)}.${Math.random().toString(36).slice(2, 7)}@example.test`,
    phone: '555-0199',
    siteAddress: '41 Orchard Terrace, Brimfield',
    yearBuilt: 1926,
    rooms: 'Dining room walls and a shallow dome over the table',
    finishIdea: 'Warm lime plaster, lightly burnished',
    timeline: 'Before spring',
    budgetRange: '5k_15k',
    heardFrom: 'designer_referral',
    referrerName: 'Ottoline Marsh Interiors',
    consent: true,
    website: '',
    startedAt: (firm.body as PublicFirm).formStamp,
    ...overrides,
  };
}
