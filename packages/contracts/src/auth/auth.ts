import { z } from 'zod';
import { requestSchema } from '../common/schema-check';
import {
  FIRM_NAME_MAX_LENGTH,
  FIRM_NAME_MIN_LENGTH,
  PASSWORD_MAX_LENGTH,
  type InvitationAccept,
  type LanguageChoice,
  type PasswordResetComplete,
  type PasswordResetRequest,
  type PortalLinkRequest,
  type PortalRedeemRequest,
  type SignInRequest,
  type SignUpConfirm,
  type SignUpRequest,
} from './auth-types';
import { LANGUAGES } from '../firms/firm-types';
import { email, newPassword, personName, token } from './fields';

export const signInRequest = requestSchema<SignInRequest>()(
  z.strictObject({
    email,
    password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }).max(PASSWORD_MAX_LENGTH),
  }),
);

export const signUpRequest = requestSchema<SignUpRequest>()(
  z.strictObject({
    firmName: z
      .string({ error: 'Enter the firm name.' })
      .trim()
      .min(FIRM_NAME_MIN_LENGTH, { error: 'Enter the firm name.' })
      .max(FIRM_NAME_MAX_LENGTH),
    name: personName,
    email,
    password: newPassword,
  }),
);

export const passwordResetRequest = requestSchema<PasswordResetRequest>()(z.strictObject({ email }));

export const signUpConfirm = requestSchema<SignUpConfirm>()(z.strictObject({ token }));

export const passwordResetComplete = requestSchema<PasswordResetComplete>()(z.strictObject({ token, password: newPassword }));

export const invitationAccept = requestSchema<InvitationAccept>()(z.strictObject({ token, name: personName, password: newPassword }));

/** Portal (client) sign-in by e-mailed one-time link. */
export const portalLinkRequest = requestSchema<PortalLinkRequest>()(z.strictObject({ email }));

export const portalRedeemRequest = requestSchema<PortalRedeemRequest>()(z.strictObject({ token }));

/** PATCH /api/auth/me/language, /api/portal/me/language, /api/team/members/:id/language: null follows the firm. */
export const languageChoice = requestSchema<LanguageChoice>()(
  z.strictObject({
    language: z.enum(LANGUAGES, { error: 'Choose English or Spanish, or leave it to the firm.' }).nullable(),
  }),
);
