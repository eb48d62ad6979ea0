import type { ClientKind } from '@layerbook/contracts';

// Copied from the contracts package (see core/auth/roles.ts for why); checked against its type.
export const CLIENT_KINDS = ['homeowner', 'designer', 'general_contractor', 'other'] as const satisfies readonly ClientKind[];

export const CLIENT_KIND_LABELS = {
  homeowner: 'Homeowner',
  designer: 'Interior designer',
  general_contractor: 'General contractor',
  other: 'Other',
} as const satisfies Record<ClientKind, string>;

type MissingKind = Exclude<ClientKind, (typeof CLIENT_KINDS)[number]>;
export const ALL_KINDS_LISTED: [MissingKind] extends [never] ? true : never = true;

export function isClientKind(value: unknown): value is ClientKind {
  return typeof value === 'string' && (CLIENT_KINDS as readonly string[]).includes(value);
}
