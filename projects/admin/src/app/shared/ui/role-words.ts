import type { StaffRole } from '@layerbook/contracts';

export interface RoleWords {
  readonly label: string;
  readonly summary: string;
}

/** How each role is named and explained wherever people choose or see one. */
export const ROLE_WORDS: Readonly<Record<StaffRole, RoleWords>> = {
  owner: { label: 'Owner', summary: 'Everything, including prices, money, settings and the team.' },
  office: { label: 'Office', summary: 'Clients, proposals, invoices and payments; no settings or team changes.' },
  crew: { label: 'Crew', summary: 'Job sheets, mix amounts, schedules and photos; no money figures.' },
};
