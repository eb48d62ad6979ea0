import { z } from 'zod';
import { requestSchema } from '../common/schema-check';
import { uuid } from '../common/fields';
import {
  FIRM_NAME_MAX_LENGTH,
  FIRM_NAME_MIN_LENGTH,
  PASSWORD_MAX_LENGTH,
  SECOND_FACTOR_CODE_MAX_LENGTH,
  TOTP_DIGITS,
  type FirmSecondFactor,
  type FirmSwitch,
  type InvitationAccept,
  type LanguageChoice,
  type PasswordResetComplete,
  type PasswordResetRequest,
  type PortalLinkRequest,
  type PortalRedeemRequest,
  type SecondFactorCheck,
  type SecondFactorConfirm,
  type SecondFactorEnrolmentStart,
  type SecondFactorTurnOff,
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

export const invitationAccept = requestSchema<InvitationAccept>()(
  z.strictObject({ token, name: personName.optional(), password: newPassword }),
);

/** Portal (client) sign-in by e-mailed one-time link. */
/** A page of the portal: `/portal/` and path segments of letters, digits, `-` and `_` (no query, no `..`). */
const portalPath = z
  .string()
  .max(500, 'At most 500 characters.')
  .regex(/^\/portal(\/[A-Za-z0-9_-]+)*\/?$/, 'A page of the portal, like /portal/invoices/….');
export const portalLinkRequest = requestSchema<PortalLinkRequest>()(z.strictObject({ email, next: portalPath.optional() }));

export const portalRedeemRequest = requestSchema<PortalRedeemRequest>()(z.strictObject({ token }));

/** PATCH /api/auth/me/language, /api/portal/me/language, /api/team/members/:id/language: null follows the firm. */
export const firmSwitch = requestSchema<FirmSwitch>()(z.strictObject({ firmId: uuid('firm') }));

export const languageChoice = requestSchema<LanguageChoice>()(
  z.strictObject({
    language: z.enum(LANGUAGES, { error: 'Choose English or Spanish, or leave it to the firm.' }).nullable(),
  }),
);

/** A code from the app or a recovery code; the server tells them apart by shape. */
const secondFactorCode = z
  .string({ error: 'Enter the code from your app or a recovery code.' })
  .trim()
  .min(1, { error: 'Enter the code from your app or a recovery code.' })
  .max(SECOND_FACTOR_CODE_MAX_LENGTH, { error: 'This is not a code from your app nor a recovery code.' });

const appCode = z
  .string({ error: `Enter the ${TOTP_DIGITS}-digit code from your app.` })
  .trim()
  .regex(new RegExp(`^[0-9]{${TOTP_DIGITS}}$`), { error: `Enter the ${TOTP_DIGITS}-digit code from your app.` });

export const secondFactorCheck = requestSchema<SecondFactorCheck>()(z.strictObject({ code: secondFactorCode }));

export const secondFactorConfirm = requestSchema<SecondFactorConfirm>()(z.strictObject({ code: appCode }));

const currentPassword = z.string().min(1, { error: 'Enter your password.' }).max(PASSWORD_MAX_LENGTH);

export const secondFactorEnrolmentStart = requestSchema<SecondFactorEnrolmentStart>()(
  z.strictObject({ password: currentPassword.optional() }),
);

export const secondFactorTurnOff = requestSchema<SecondFactorTurnOff>()(
  z
    .strictObject({
      code: secondFactorCode.optional(),
      password: currentPassword.optional(),
    })
    .refine((b) => b.code !== undefined || b.password !== undefined, {
      path: ['code'],
      error: 'Enter a code from your app, a recovery code or your password.',
    }),
);

export const firmSecondFactor = requestSchema<FirmSecondFactor>()(
  z.strictObject({ required: z.boolean({ error: 'Say whether a second factor is required.' }) }),
);
