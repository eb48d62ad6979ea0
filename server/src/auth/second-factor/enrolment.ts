import type { RecoveryCodes, SecondFactorEnrolment, SecondFactorStatus } from '@layerbook/contracts';
import { eq, firms, memberships, type TenantTx } from '@layerbook/db';
import QRCode from 'qrcode';
import { recordAudit } from '../../audit/record';
import type { AppContext } from '../../context';
import type { StaffPrincipal } from '../../http/principal';
import { conflict, notFound } from '../../http/problem';
import { newRecoveryCodes, normaliseRecoveryCode } from './recovery-codes';
import { endSessionsIfFactorMissing, endSessionsWithoutFactor } from './rule-sessions';
import { openSecret, recoveryCodeHash, sealSecret } from './secret-box';
import { factorOf, keepPendingSecret, recoveryCodesLeft, removeFactor, replaceRecoveryCodes, takeStep } from './store';
import { acceptedStep, newTotpSecret, otpauthUri, secretGroups } from './totp';
import { firmRequiresSecondFactor } from './verify';

const audit = (tx: TenantTx, staff: StaffPrincipal, action: string, data?: Record<string, unknown>) =>
  recordAudit(tx, { actorUserId: staff.id, actorKind: 'staff', action, entity: 'user', entityId: staff.id, data });

export async function secondFactorStatus(tx: TenantTx, staff: StaffPrincipal): Promise<SecondFactorStatus> {
  const row = await factorOf(tx, staff.id);
  const enrolled = !!row?.confirmedAt;
  return {
    enrolled,
    enrolledAt: row?.confirmedAt?.toISOString() ?? null,
    recoveryCodesLeft: enrolled ? await recoveryCodesLeft(tx, staff.id) : 0,
    firmRequires: await firmRequiresSecondFactor(tx),
  };
}

/** A new secret, kept sealed until the first code confirms it; the answer is what the app reads. */
export async function startEnrolment(ctx: AppContext, tx: TenantTx, staff: StaffPrincipal): Promise<SecondFactorEnrolment> {
  const secret = newTotpSecret();
  if (!(await keepPendingSecret(tx, staff.id, sealSecret(ctx.config, staff.id, secret), ctx.now()))) {
    throw conflict('A second factor is already on. Turn it off first to set up another.');
  }
  const uri = otpauthUri(staff.email, secret);
  const qrDataUrl = await QRCode.toDataURL(uri, { errorCorrectionLevel: 'M', margin: 2, width: 232 });
  return { otpauthUri: uri, qrDataUrl, secretGroups: secretGroups(secret) };
}

/** The first right code turns the factor on and answers ten recovery codes (only their hashes are kept); null for a wrong code. */
export async function confirmEnrolment(ctx: AppContext, tx: TenantTx, staff: StaffPrincipal, code: string): Promise<string[] | null> {
  const now = ctx.now();
  const row = await factorOf(tx, staff.id);
  if (!row || row.confirmedAt) {
    throw conflict('Start the set-up again: there is no set-up waiting for a code.', [
      { field: 'code', message: 'Start the set-up again: there is no set-up waiting for a code.' },
    ]);
  }
  const step = acceptedStep(openSecret(ctx.config, staff.id, row.secretSealed), code, now, row.lastUsedStep);
  if (step === null || !(await takeStep(tx, staff.id, step, now, true))) return null;
  const codes = await storeNewCodes(ctx, tx, staff.id);
  await audit(tx, staff, 'staff.secondFactorEnrolled');
  return codes;
}

export async function renewRecoveryCodes(ctx: AppContext, tx: TenantTx, staff: StaffPrincipal): Promise<RecoveryCodes> {
  const row = await factorOf(tx, staff.id);
  if (!row?.confirmedAt) throw conflict('Turn on a second factor first.');
  const codes = await storeNewCodes(ctx, tx, staff.id);
  await audit(tx, staff, 'staff.recoveryCodesRenewed');
  return { codes };
}

async function storeNewCodes(ctx: AppContext, tx: TenantTx, userId: string): Promise<string[]> {
  const codes = newRecoveryCodes();
  const hashes = codes.map((c) => recoveryCodeHash(ctx.config, normaliseRecoveryCode(c) ?? c));
  await replaceRecoveryCodes(tx, userId, hashes, ctx.now());
  return codes;
}

/** Turns the person's second factor off (proof checked by the caller); refused while the firm requires one. */
export async function turnOff(tx: TenantTx, staff: StaffPrincipal): Promise<void> {
  if (await firmRequiresSecondFactor(tx)) {
    throw conflict('Your firm requires a second factor for owner and office, so it cannot be turned off.');
  }
  if (await removeFactor(tx, staff.id)) await audit(tx, staff, 'staff.secondFactorRemoved');
}

/**
 * The owner's rule for the firm. Turning it on needs the owner's own second factor first, so the
 * owner cannot be sent to set one up by their own switch. Turning it on also ends, in this firm, the
 * open sessions of owner and office members without a confirmed factor (the rule is otherwise only
 * checked at sign-in). The person switching is never among them: they just proved to have a
 * confirmed factor, so their own session (the one making this request) goes on; nobody is locked
 * out mid-request and no exception is needed.
 */
export async function setFirmRequirement(tx: TenantTx, staff: StaffPrincipal, required: boolean): Promise<void> {
  if (required === (await firmRequiresSecondFactor(tx))) return;
  if (required && !(await factorOf(tx, staff.id))?.confirmedAt) {
    throw conflict('Turn on your own second factor first.', [{ field: 'required', message: 'Turn on your own second factor first.' }]);
  }
  await tx.db.update(firms).set({ secondFactorRequired: required }).where(eq(firms.id, tx.tenantId));
  if (required) await endSessionsWithoutFactor(tx);
  await recordAudit(tx, {
    actorUserId: staff.id,
    actorKind: 'staff',
    action: 'firm.secondFactorRequired',
    entity: 'firm',
    entityId: tx.tenantId,
    data: { required },
  });
}

/** Whether this person also belongs to another firm (read through the memberships' look-up-by-person policy, then set back). */
async function belongsElsewhere(tx: TenantTx, userId: string): Promise<boolean> {
  await tx.client.query(`select set_config('app.user_id', $1, true)`, [userId]);
  try {
    const { rowCount } = await tx.client.query(`select 1 from memberships where user_id = $1 and tenant_id <> $2 limit 1`, [
      userId,
      tx.tenantId,
    ]);
    return (rowCount ?? 0) > 0;
  } finally {
    await tx.client.query(`select set_config('app.user_id', '', true)`);
  }
}

/**
 * The owner clears a member's second factor (a lost phone and lost recovery codes): the member signs
 * in with the password alone again, or sets one up at once when the firm requires it. Owners clear
 * their own on Sign-in and security instead. A person's factor guards every firm they belong to, so
 * one firm's owner cannot clear it for someone who also belongs to another firm (409): they turn it
 * off themselves with a recovery code.
 */
export async function resetMemberFactor(tx: TenantTx, owner: StaffPrincipal, membershipId: string): Promise<void> {
  const [member] = await tx.db.select({ userId: memberships.userId }).from(memberships).where(eq(memberships.id, membershipId));
  if (!member) throw notFound('team member');
  if (member.userId === owner.id) throw conflict('Turn your own second factor off on Sign-in and security.');
  if (await belongsElsewhere(tx, member.userId)) {
    throw conflict(
      'This person also belongs to another firm, and their second factor guards that firm too. They can turn it off themselves with a recovery code.',
    );
  }
  if (await removeFactor(tx, member.userId)) {
    // Where the firm requires one, their open sessions end too: the next sign-in sets a new one up.
    await endSessionsIfFactorMissing(tx, member.userId);
    await recordAudit(tx, {
      actorUserId: owner.id,
      actorKind: 'staff',
      action: 'staff.secondFactorReset',
      entity: 'user',
      entityId: member.userId,
    });
  }
}
