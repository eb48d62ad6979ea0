import type { Language, StaffRole, UnitSystem } from '@layerbook/contracts';

/** A firm's staff member (admin app), as loaded inside a request's firm transaction. */
export interface StaffPrincipal {
  readonly kind: 'staff';
  readonly id: string; // user id
  readonly membershipId: string;
  readonly tenantId: string;
  readonly role: StaffRole;
  readonly name: string;
  readonly email: string;
  readonly firmName: string;
  /** The firm's calendar and money, loaded with the principal so routes need no extra query. */
  readonly timeZone: string;
  readonly currency: string;
  /** what this person reads in: their own choice, else the firm's language */
  readonly language: Language;
  /** their own choice; null follows the firm */
  readonly ownLanguage: Language | null;
  /** the firm's units */
  readonly units: UnitSystem;
  readonly country: string;
}

/** A firm's client (portal). */
export interface ClientPrincipal {
  readonly kind: 'client';
  readonly id: string; // portal user id
  readonly tenantId: string;
  readonly name: string;
  readonly email: string;
  readonly firmName: string;
  /** the client's language (portal, e-mails, PDFs): the client's own, else the firm's */
  readonly language: Language;
  /**
   * The client's own choice (null follows the firm) and the firm's language, loaded with the session
   * so the portal's language menu can show which is chosen.
   */
  readonly ownLanguage: Language | null;
  readonly firmLanguage: Language;
  readonly country: string;
}

export type Principal = StaffPrincipal | ClientPrincipal;

/**
 * What the session keeps and `req.user` holds: who claims to be signed in, and to which firm.
 * It is only a claim: every route re-loads the person inside its own firm transaction
 * (withStaff / withClient), so deactivation and role changes apply on the next request.
 */
export interface SessionPrincipal {
  readonly kind: 'staff' | 'client';
  readonly id: string;
  readonly tenantId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionPrincipal {}
  }
}
