import type { ProposalSnapshot } from '@layerbook/contracts/types';

/** An invented proposal as sent (no options, no cautions), for specs to extend: only what they look at differs. */
export const SNAPSHOT: ProposalSnapshot = {
  schemaVersion: 1,
  title: 'Dining room in lime',
  issuedOn: '2026-03-02',
  expiresOn: '2026-04-01',
  currency: 'USD',
  locale: 'en-US',
  lengthUnit: 'ft',
  firm: { name: 'Quillfeather Finishes', addressLines: [], phone: '' },
  client: { name: 'Ada Client', email: 'ada@example.com', phone: '' },
  site: { label: 'Home', addressLines: ['1 Elm St'], yearBuilt: 1990 },
  scope: [],
  options: [],
  addOns: [],
  exclusions: [],
  notes: '',
  terms: { depositPercent: 0, progressPercent: 0, text: '' },
  safety: { standing: '', cautions: [] },
};
