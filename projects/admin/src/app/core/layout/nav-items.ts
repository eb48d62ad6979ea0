import type { StaffRole } from '@layerbook/contracts/types';

export interface NavItem {
  /** translation key (layout.nav.*) */
  readonly label: string;
  readonly icon: string;
  readonly path: string;
  /** Least trusted role that sees the item; the server enforces the same rule. */
  readonly minRole: StaffRole;
}

export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'layout.nav.today', icon: 'wb_sunny', path: '/today', minRole: 'crew' },
  { label: 'layout.nav.jobSheets', icon: 'assignment', path: '/sheets', minRole: 'crew' },
  { label: 'layout.nav.inquiries', icon: 'call', path: '/inquiries', minRole: 'office' },
  { label: 'layout.nav.clients', icon: 'group', path: '/clients', minRole: 'office' },
  { label: 'layout.nav.estimates', icon: 'request_quote', path: '/estimates', minRole: 'office' },
  { label: 'layout.nav.jobs', icon: 'format_paint', path: '/jobs', minRole: 'office' },
  { label: 'layout.nav.billing', icon: 'receipt_long', path: '/billing', minRole: 'office' },
  { label: 'layout.nav.cash', icon: 'savings', path: '/cash', minRole: 'office' },
  { label: 'layout.nav.samples', icon: 'palette', path: '/samples', minRole: 'crew' },
  { label: 'layout.nav.library', icon: 'layers', path: '/library', minRole: 'crew' },
  { label: 'layout.nav.team', icon: 'badge', path: '/team', minRole: 'crew' },
  { label: 'layout.nav.settings', icon: 'tune', path: '/settings', minRole: 'office' },
  { label: 'audit.nav', icon: 'history', path: '/activity', minRole: 'owner' },
  { label: 'auth.nav.security', icon: 'shield', path: '/security', minRole: 'office' },
];
