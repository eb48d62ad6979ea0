import { z } from 'zod';
import { email, newPassword, personName, token } from './fields';
import { staffRole } from './roles';

export const signInRequest = z.strictObject({
  email,
  password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }).max(128),
});
export type SignInRequest = z.infer<typeof signInRequest>;

export const signUpRequest = z.strictObject({
  firmName: z.string({ error: 'Enter the firm name.' }).trim().min(2, { error: 'Enter the firm name.' }).max(120),
  name: personName,
  email,
  password: newPassword,
});
export type SignUpRequest = z.infer<typeof signUpRequest>;

export const passwordResetRequest = z.strictObject({ email });
export type PasswordResetRequest = z.infer<typeof passwordResetRequest>;

export const passwordResetComplete = z.strictObject({ token, password: newPassword });
export type PasswordResetComplete = z.infer<typeof passwordResetComplete>;

export const invitationAccept = z.strictObject({ token, name: personName, password: newPassword });
export type InvitationAccept = z.infer<typeof invitationAccept>;

/** What the admin app knows about who is signed in. */
export interface StaffSession {
  readonly user: {
    readonly id: string;
    readonly name: string;
    readonly email: string;
    readonly role: z.infer<typeof staffRole>;
    readonly firmId: string;
    readonly firmName: string;
  } | null;
  readonly csrfToken: string;
}

export interface InvitationPreview {
  readonly firmName: string;
  readonly email: string;
  readonly role: z.infer<typeof staffRole>;
}

/** Portal (client) sign-in by e-mailed one-time link. */
export const portalLinkRequest = z.strictObject({ email });
export type PortalLinkRequest = z.infer<typeof portalLinkRequest>;

export const portalRedeemRequest = z.strictObject({ token });
export type PortalRedeemRequest = z.infer<typeof portalRedeemRequest>;

export interface PortalSession {
  readonly client: {
    readonly id: string;
    readonly name: string;
    readonly email: string;
    readonly firmId: string;
    readonly firmName: string;
  } | null;
  readonly csrfToken: string;
}
