import type { StaffRole } from '@layerbook/contracts';

/** Who is making the request: a firm's staff member (admin app) or a client (portal). */
export interface StaffPrincipal {
  readonly kind: 'staff';
  readonly id: string; // user id
  readonly membershipId: string;
  readonly tenantId: string;
  readonly role: StaffRole;
  readonly name: string;
  readonly email: string;
  readonly firmName: string;
}

export interface ClientPrincipal {
  readonly kind: 'client';
  readonly id: string; // portal user id
  readonly tenantId: string;
  readonly name: string;
  readonly email: string;
  readonly firmName: string;
}

export type Principal = StaffPrincipal | ClientPrincipal;

/** What the session cookie's record keeps: enough to reload the principal, nothing more. */
export interface SessionPrincipal {
  readonly kind: 'staff' | 'client';
  readonly id: string;
  readonly tenantId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // Passport types req.user as Express.User; ours is always a Principal.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Partial<Omit<StaffPrincipal, 'kind'>> {
      readonly kind: 'staff' | 'client';
      readonly id: string;
      readonly tenantId: string;
      readonly name: string;
      readonly email: string;
      readonly firmName: string;
    }
  }
}
