import { TOTP_DIGITS } from '@layerbook/contracts/types';

/** Six digits, spaces around them forgiven (apps show "123 456"). */
export const APP_CODE = new RegExp(`^\\s*(\\d\\s?){${TOTP_DIGITS - 1}}\\d\\s*$`);

export const CODE_ERRORS = { required: 'auth.secondFactor.codeRequired', pattern: 'auth.secondFactor.codeDigits' };
export const RECOVERY_CODE_ERRORS = { required: 'auth.secondFactor.recoveryRequired', maxlength: 'auth.secondFactor.recoveryTooLong' };

/** What is sent for an app code: the digits alone. */
export const appCodeDigits = (typed: string) => typed.replace(/\s/g, '');
