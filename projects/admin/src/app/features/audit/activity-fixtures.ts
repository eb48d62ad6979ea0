import type { AuditEntry, AuditPage, ItemList, TeamMember } from '@layerbook/contracts/types';

/** Invented people and records of an invented firm, as GET /api/audit and /api/team/members answer them. */
export const OWNER_ID = '0d7c5e0a-8a51-4c44-9a39-5a0c0f9b1c01';
export const OFFICE_ID = '0d7c5e0a-8a51-4c44-9a39-5a0c0f9b1c02';
export const INVOICE_ID = 'a1f0c3e2-7b64-4d1e-9c2a-3f5e6d7c8b90';

export const TEAM: ItemList<TeamMember> = {
  items: [
    {
      id: 'm1',
      userId: OWNER_ID,
      name: 'Wren Calloway',
      email: 'wren@fern.example',
      role: 'owner',
      status: 'active',
      isYou: true,
      language: null,
      hasSecondFactor: false,
    },
    {
      id: 'm2',
      userId: OFFICE_ID,
      name: 'Priya Ashdown',
      email: 'priya@fern.example',
      role: 'office',
      status: 'active',
      isYou: false,
      language: null,
      hasSecondFactor: false,
    },
  ],
};

export const ISSUED: AuditEntry = {
  id: 'e1',
  at: '2026-12-02T15:04:00.000Z',
  actor: { kind: 'staff', id: OFFICE_ID, name: 'Priya Ashdown', email: 'priya@fern.example' },
  action: 'invoice.issued',
  kind: 'invoices',
  entity: 'invoice',
  entityId: INVOICE_ID,
  summary: 'Issued invoice INV-0007 for 1200.00, due 2026-12-31',
  link: { area: 'invoice', id: INVOICE_ID },
};

export const REFUND_CHECK: AuditEntry = {
  id: 'e2',
  at: '2026-12-02T09:00:00.000Z',
  actor: { kind: 'system', id: null, name: null, email: null },
  action: 'invoice.refund_needs_attention',
  kind: 'payments',
  entity: 'invoice',
  entityId: INVOICE_ID,
  summary: 'A card refund of 50.00 needs checking',
  link: { area: 'invoice', id: INVOICE_ID },
};

export const SIGNED_IN: AuditEntry = {
  id: 'e3',
  at: '2026-12-01T13:00:00.000Z',
  actor: { kind: 'staff', id: OWNER_ID, name: 'Wren Calloway', email: 'wren@fern.example' },
  action: 'staff.signedIn',
  kind: 'signIns',
  entity: 'user',
  entityId: OWNER_ID,
  summary: 'Signed in with the second factor',
  link: null,
};

export const FIRST_PAGE: AuditPage = { items: [ISSUED, REFUND_CHECK], nextCursor: 'cursor-2' };
export const SECOND_PAGE: AuditPage = { items: [SIGNED_IN], nextCursor: null };
export const EMPTY_PAGE: AuditPage = { items: [], nextCursor: null };
