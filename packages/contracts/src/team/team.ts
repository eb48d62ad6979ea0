import { z } from 'zod';
import { email } from '../auth/fields';
import { staffRole, StaffRole } from '../auth/roles';

export const invitationCreate = z.strictObject({
  email,
  role: staffRole,
});
export type InvitationCreate = z.infer<typeof invitationCreate>;

export const memberRoleUpdate = z.strictObject({ role: staffRole });
export type MemberRoleUpdate = z.infer<typeof memberRoleUpdate>;

export const idParam = z.strictObject({ id: z.uuid({ error: 'Not a valid id.' }) });

export type MemberStatus = 'active' | 'deactivated';
export type InvitationStatus = 'pending' | 'accepted' | 'revoked' | 'expired';

export interface TeamMember {
  readonly id: string;
  readonly userId: string;
  readonly name: string;
  readonly email: string;
  readonly role: StaffRole;
  readonly status: MemberStatus;
  readonly isYou: boolean;
}

export interface TeamInvitation {
  readonly id: string;
  readonly email: string;
  readonly role: StaffRole;
  readonly status: InvitationStatus;
  readonly expiresAt: string;
  readonly createdAt: string;
}

export interface TeamView {
  readonly members: readonly TeamMember[];
  readonly invitations: readonly TeamInvitation[];
}
