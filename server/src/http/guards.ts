import { roleAtLeast, StaffRole } from '@layerbook/contracts';
import type { Request } from 'express';
import type { ClientPrincipal, StaffPrincipal } from './principal';
import { forbidden, unauthorized } from './problem';

/** Function-level authorisation: every staff route names the least role it needs. */
export function requireStaff(req: Request, needed: StaffRole = 'crew'): StaffPrincipal {
  const user = req.user;
  if (!user || user.kind !== 'staff') throw unauthorized();
  const staff = user as StaffPrincipal;
  if (!roleAtLeast(staff.role, needed)) throw forbidden();
  return staff;
}

export function requireClient(req: Request): ClientPrincipal {
  const user = req.user;
  if (!user || user.kind !== 'client') throw unauthorized('Sign in with the link we e-mail you.');
  return user as ClientPrincipal;
}
