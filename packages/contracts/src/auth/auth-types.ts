/**
 * Sign-in, sessions and roles without zod: roles with their words, field limits, what the apps
 * send and what the auth routes answer. The zod schemas (auth.ts, fields.ts) are built from these.
 */
import type { Language, UnitSystem } from '../firms/firm-types';

/** Staff roles of a firm, from most to least trusted. Clients use the portal only. */
export const STAFF_ROLES = ['owner', 'office', 'crew'] as const;
export type StaffRole = (typeof STAFF_ROLES)[number];

/** How each role is named wherever people choose or see one. */
export const STAFF_ROLE_LABELS: Readonly<Record<StaffRole, string>> = {
  owner: 'Owner',
  office: 'Office',
  crew: 'Crew',
};

/** What each role may do, in one line, beside the role's name. */
export const STAFF_ROLE_SUMMARIES: Readonly<Record<StaffRole, string>> = {
  owner: 'Everything, including prices, money, settings and the team.',
  office: 'Clients, proposals, invoices and payments; no settings or team changes.',
  crew: 'Job sheets, mix amounts, schedules and photos; no money figures.',
};

/** owner ⊃ office ⊃ crew: a route or page that needs `office` admits owners too. */
export function roleAtLeast(actual: StaffRole, needed: StaffRole): boolean {
  return STAFF_ROLES.indexOf(actual) <= STAFF_ROLES.indexOf(needed);
}

export function isStaffRole(value: unknown): value is StaffRole {
  return typeof value === 'string' && (STAFF_ROLES as readonly string[]).includes(value);
}

/** RFC 5321 caps a forward path at 256 octets, 254 of them the address. */
export const EMAIL_MAX_LENGTH = 254;
/** OWASP ASVS 2.1: at least 8 characters, long passphrases allowed, no composition rules. */
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;
export const PERSON_NAME_MAX_LENGTH = 120;
export const FIRM_NAME_MIN_LENGTH = 2;
export const FIRM_NAME_MAX_LENGTH = 120;
/** The code in an e-mailed one-time link (invitation, password reset, portal sign-in). */
export const LINK_TOKEN_PATTERN = /^[A-Za-z0-9_-]{32,128}$/;

export function isWellFormedLinkToken(token: unknown): token is string {
  return typeof token === 'string' && LINK_TOKEN_PATTERN.test(token);
}

// What the apps send.
export interface SignInRequest {
  readonly email: string;
  readonly password: string;
}
export interface SignUpRequest {
  readonly firmName: string;
  readonly name: string;
  readonly email: string;
  readonly password: string;
}
/** POST /api/auth/signup/confirm: the code from the e-mailed confirmation link. */
export interface SignUpConfirm {
  readonly token: string;
}
/** POST /api/auth/signup answers this alike for a new and a known e-mail (202). */
export const SIGN_UP_SENT_DETAIL = 'Check your inbox to finish: we sent a link to that e-mail address.';
export interface PasswordResetRequest {
  readonly email: string;
}
export interface PasswordResetComplete {
  readonly token: string;
  readonly password: string;
}
export interface InvitationAccept {
  readonly token: string;
  /** a new person's name; someone who already has an account keeps theirs */
  readonly name?: string;
  readonly password: string;
}
export interface PortalLinkRequest {
  readonly email: string;
  /** the portal page to open once signed in (`/portal/invoices/…`); the link carries it */
  readonly next?: string;
}
export interface PortalRedeemRequest {
  readonly token: string;
}

// What the auth routes answer.
export interface StaffUser {
  readonly id: string;
  readonly name: string;
  readonly email: string;
  readonly role: StaffRole;
  readonly firmId: string;
  readonly firmName: string;
  /** the language this person reads in: their own choice, else the firm's */
  readonly language: Language;
  /** the person's own choice (null = follow the firm's language) */
  readonly ownLanguage: Language | null;
  /** the firm's units, for what the crew reads */
  readonly units: UnitSystem;
  /** the firm's country (ISO 3166-1 alpha-2), for number and date conventions */
  readonly country: string;
  /** the firm's time zone (IANA), so forms start from the firm's today, as the API dates things */
  readonly timeZone: string;
  /** the other firms this person is an active member of, by name: they can switch to one (POST /api/auth/firm) */
  readonly otherFirms: readonly FirmChoice[];
}

/** A firm a person may switch to, and what they are there. */
export interface FirmChoice {
  readonly id: string;
  readonly name: string;
  readonly role: StaffRole;
}

/** POST /api/auth/firm: enter another firm the signed-in person belongs to. */
export interface FirmSwitch {
  readonly firmId: string;
}

/** What the admin app knows about who is signed in (every /api/auth answer that signs in or out). */
export interface StaffSession {
  readonly user: StaffUser | null;
  readonly csrfToken: string;
  /** set between the password and the second factor (user is null meanwhile) */
  readonly secondFactor?: SecondFactorPending | null;
}

/** GET /api/auth/invitations/:token: what the invited person is joining. */
export interface InvitationPreview {
  readonly firmName: string;
  readonly email: string;
  readonly role: StaffRole;
  /** the invited address already has a Layerbook account: joining takes its password, not a new one */
  readonly hasAccount: boolean;
}

export interface PortalClient {
  readonly id: string;
  readonly name: string;
  readonly email: string;
  readonly firmId: string;
  readonly firmName: string;
  /** the language of the client's portal, e-mails and PDFs: the client's own, else the firm's */
  readonly language: Language;
  /** the client's own choice (null = follow the firm's language) */
  readonly ownLanguage: Language | null;
  /** the firm's language, which the client reads in while they follow it */
  readonly firmLanguage: Language;
  /** the firm's country (ISO 3166-1 alpha-2) */
  readonly country: string;
}

/** Portal (client) session: signed in by an e-mailed one-time link. */
export interface PortalSession {
  readonly client: PortalClient | null;
  readonly csrfToken: string;
  /** Set when this browser was signed in as a client whose portal access the firm has since turned off. */
  readonly accessOff?: { readonly firmName: string };
}

/**
 * Problem types (RFC 9457 `type`) the apps tell apart from others of the same status:
 * `csrf` a 403 for a stale or missing security token (fetch the session's token and send again);
 * `portalAccessOff` a 410 for a sign-in link of a client whose portal access the firm turned off.
 */
export const PROBLEM_TYPES = {
  csrf: 'https://layerbook.local/problems/csrf',
  portalAccessOff: 'https://layerbook.local/problems/portal-access-off',
} as const;

/** PATCH /api/auth/me/language (staff, for themselves) and /api/portal/me/language (the client): null follows the firm. */
export interface LanguageChoice {
  readonly language: Language | null;
}

// A second factor (TOTP, RFC 6238) for owner and office staff, with one-time recovery codes.
/** Digits of a code from an authenticator app. */
export const TOTP_DIGITS = 6;
/** How many recovery codes one enrolment (or renewal) hands out; each works once. */
export const RECOVERY_CODE_COUNT = 10;
/** The longest code the second-factor step reads (a recovery code with its dash and spaces). */
export const SECOND_FACTOR_CODE_MAX_LENGTH = 32;

/**
 * After the password, before the person is signed in: `code` asks for a code (or a recovery code),
 * `enrol` asks them to set up a second factor first (their firm requires one). Nothing of the firm
 * is readable meanwhile; the step ends at `expiresAt`.
 */
export type SecondFactorStep = 'code' | 'enrol';
export interface SecondFactorPending {
  readonly step: SecondFactorStep;
  readonly expiresAt: string;
}

/** POST /api/auth/second-factor: a code from the app (6 digits) or one recovery code. */
export interface SecondFactorCheck {
  readonly code: string;
}
/**
 * POST /api/auth/second-factor/enrolment: signed in, the password (the same proof as renewing codes
 * or turning it off: a session alone is not enough); right after the password at sign-in, nothing.
 */
export interface SecondFactorEnrolmentStart {
  readonly password?: string;
}
/** POST /api/auth/second-factor/enrolment/confirm: the first code from the app. */
export interface SecondFactorConfirm {
  readonly code: string;
}
/** POST /api/auth/second-factor/turn-off: a current code (or a recovery code) or the password. */
export interface SecondFactorTurnOff {
  readonly code?: string;
  readonly password?: string;
}
/** PUT /api/auth/second-factor/firm (owner): whether owner and office must use a second factor. */
export interface FirmSecondFactor {
  readonly required: boolean;
}

/** POST /api/auth/second-factor/enrolment: what the person adds to their authenticator app. */
export interface SecondFactorEnrolment {
  readonly otpauthUri: string;
  /** the same URI as a QR code (PNG data URL) */
  readonly qrDataUrl: string;
  /** the secret in groups of four, for typing it in by hand */
  readonly secretGroups: readonly string[];
}
/** Recovery codes, shown once (only their hashes are kept). */
export interface RecoveryCodes {
  readonly codes: readonly string[];
}
/**
 * Confirming an enrolment answers the codes with the whole session (signed in when the enrolment
 * finished a sign-in), so the apps pick up the new CSRF token as from any session answer.
 */
export interface SecondFactorEnrolled extends StaffSession, RecoveryCodes {}
/** GET /api/auth/second-factor: the signed-in person's second factor and their firm's rule. */
export interface SecondFactorStatus {
  readonly enrolled: boolean;
  readonly enrolledAt: string | null;
  readonly recoveryCodesLeft: number;
  readonly firmRequires: boolean;
}
