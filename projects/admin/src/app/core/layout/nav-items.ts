import type { StaffRole } from '@layerbook/contracts/types';

export interface NavItem {
  readonly label: string;
  readonly icon: string;
  readonly path: string;
  /** Least trusted role that sees the item; the server enforces the same rule. */
  readonly minRole: StaffRole;
}

export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Today', icon: 'wb_sunny', path: '/today', minRole: 'crew' },
  { label: 'Job sheets', icon: 'assignment', path: '/sheets', minRole: 'crew' },
  { label: 'Inquiries', icon: 'call', path: '/inquiries', minRole: 'office' },
  { label: 'Clients', icon: 'group', path: '/clients', minRole: 'office' },
  { label: 'Estimates', icon: 'request_quote', path: '/estimates', minRole: 'office' },
  { label: 'Jobs', icon: 'format_paint', path: '/jobs', minRole: 'office' },
  { label: 'Billing', icon: 'receipt_long', path: '/billing', minRole: 'office' },
  { label: 'Cash', icon: 'savings', path: '/cash', minRole: 'office' },
  { label: 'Sample boards', icon: 'palette', path: '/samples', minRole: 'crew' },
  { label: 'Finish library', icon: 'layers', path: '/library', minRole: 'crew' },
  { label: 'Team', icon: 'badge', path: '/team', minRole: 'crew' },
  { label: 'Settings', icon: 'tune', path: '/settings', minRole: 'office' },
];
