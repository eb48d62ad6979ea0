import type { StaffRole } from '@layerbook/contracts';
import type { ClientPrincipal, StaffPrincipal } from './principal';

/**
 * Who did something, as service functions see and record it (audit rows, activity, "made by"):
 * a staff member with their role, a client in the portal, or the system (a queue job). Services
 * take an Actor rather than a principal, so jobs can call them too.
 */
export type Actor =
  | { readonly kind: 'staff'; readonly userId: string; readonly role: StaffRole }
  | { readonly kind: 'client'; readonly userId: string }
  | { readonly kind: 'system'; readonly userId: null };

export const staffActor = (staff: Pick<StaffPrincipal, 'id' | 'role'>): Actor => ({ kind: 'staff', userId: staff.id, role: staff.role });
export const clientActor = (client: Pick<ClientPrincipal, 'id'>): Actor => ({ kind: 'client', userId: client.id });
export const SYSTEM_ACTOR: Actor = { kind: 'system', userId: null };

/** Crew read the library and the job sheet without money figures. */
export const canSeeMoney = (actor: Actor): boolean => actor.kind !== 'staff' || actor.role !== 'crew';
