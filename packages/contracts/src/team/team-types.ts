import type { StaffRole } from '../auth/auth-types';
import type { Language } from '../firms/firm-types';

/** A member may sign in while active; a deactivated member keeps their history but not access. */
export const MEMBER_STATUSES = ['active', 'deactivated'] as const;
export type MemberStatus = (typeof MEMBER_STATUSES)[number];
export const MEMBER_STATUS_LABELS: Readonly<Record<MemberStatus, string>> = {
  active: 'Active',
  deactivated: 'Deactivated',
};

export const INVITATION_STATUSES = ['pending', 'accepted', 'revoked', 'expired'] as const;
export type InvitationStatus = (typeof INVITATION_STATUSES)[number];
export const INVITATION_STATUS_LABELS: Readonly<Record<InvitationStatus, string>> = {
  pending: 'Waiting for an answer',
  accepted: 'Accepted',
  revoked: 'Revoked',
  expired: 'Expired',
};

/** How long an invitation link works. */
export const INVITATION_DAYS = 7;

// What the apps send.
export interface InvitationCreate {
  readonly email: string;
  readonly role: StaffRole;
}
export interface MemberRoleUpdate {
  readonly role: StaffRole;
}

// What the team routes answer.
/** GET /api/team/members (ItemList), and each change to one member. */
export interface TeamMember {
  readonly id: string;
  readonly userId: string;
  readonly name: string;
  readonly email: string;
  readonly role: StaffRole;
  readonly status: MemberStatus;
  readonly isYou: boolean;
  /** the member's own language; null follows the firm's */
  readonly language: Language | null;
  /** a confirmed second factor guards their sign-in (the owner may clear a lost one) */
  readonly hasSecondFactor: boolean;
}

/** GET /api/team/invitations (ItemList: those waiting or expired), and a new invitation. */
export interface TeamInvitation {
  readonly id: string;
  readonly email: string;
  readonly role: StaffRole;
  readonly status: InvitationStatus;
  readonly expiresAt: string;
  readonly createdAt: string;
}
