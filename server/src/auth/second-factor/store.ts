import { and, eq, isNull, sql, userRecoveryCodes, userSecondFactors, type Tx } from '@layerbook/db';

/**
 * A person's second factor and recovery codes (not firm data: they belong to the person). Writes
 * run inside the firm transaction that also records the audit entry, so both happen or neither.
 */
export interface FactorRow {
  readonly secretSealed: string;
  readonly confirmedAt: Date | null;
  readonly lastUsedStep: number | null;
}

export async function factorOf(tx: Tx, userId: string): Promise<FactorRow | null> {
  const [row] = await tx.db
    .select({
      secretSealed: userSecondFactors.secretSealed,
      confirmedAt: userSecondFactors.confirmedAt,
      lastUsedStep: userSecondFactors.lastUsedStep,
    })
    .from(userSecondFactors)
    .where(eq(userSecondFactors.userId, userId));
  return row ?? null;
}

/** Keeps a new secret waiting for its first code (replacing an earlier unfinished one); false when one is already on. */
export async function keepPendingSecret(tx: Tx, userId: string, secretSealed: string, now: Date): Promise<boolean> {
  const rows = await tx.db
    .insert(userSecondFactors)
    .values({ userId, secretSealed, createdAt: now, updatedAt: now })
    .onConflictDoUpdate({
      target: userSecondFactors.userId,
      set: { secretSealed, lastUsedStep: null, updatedAt: now },
      setWhere: isNull(userSecondFactors.confirmedAt),
    })
    .returning({ userId: userSecondFactors.userId });
  return rows.length === 1;
}

/**
 * Takes a time step as used, once: true only when it is newer than the last step used (so two
 * requests with the same code cannot both pass). `confirming` also turns the factor on.
 */
export async function takeStep(tx: Tx, userId: string, step: number, now: Date, confirming = false): Promise<boolean> {
  const rows = await tx.db
    .update(userSecondFactors)
    .set({ lastUsedStep: step, updatedAt: now, ...(confirming ? { confirmedAt: now } : {}) })
    .where(
      and(
        eq(userSecondFactors.userId, userId),
        confirming ? isNull(userSecondFactors.confirmedAt) : sql`${userSecondFactors.confirmedAt} is not null`,
        sql`(${userSecondFactors.lastUsedStep} is null or ${userSecondFactors.lastUsedStep} < ${step})`,
      ),
    )
    .returning({ userId: userSecondFactors.userId });
  return rows.length === 1;
}

/** Spends a recovery code: true once, for an unused code of this person. */
export async function spendRecoveryCode(tx: Tx, userId: string, codeHash: string, now: Date): Promise<boolean> {
  const rows = await tx.db
    .update(userRecoveryCodes)
    .set({ usedAt: now })
    .where(and(eq(userRecoveryCodes.userId, userId), eq(userRecoveryCodes.codeHash, codeHash), isNull(userRecoveryCodes.usedAt)))
    .returning({ id: userRecoveryCodes.id });
  return rows.length === 1;
}

/** The person's recovery codes become these (the old ones stop working). */
export async function replaceRecoveryCodes(tx: Tx, userId: string, codeHashes: readonly string[], now: Date): Promise<void> {
  await tx.db.delete(userRecoveryCodes).where(eq(userRecoveryCodes.userId, userId));
  await tx.db.insert(userRecoveryCodes).values(codeHashes.map((codeHash) => ({ userId, codeHash, createdAt: now })));
}

export async function recoveryCodesLeft(tx: Tx, userId: string): Promise<number> {
  const [row] = await tx.db
    .select({ left: sql<number>`count(*)::int` })
    .from(userRecoveryCodes)
    .where(and(eq(userRecoveryCodes.userId, userId), isNull(userRecoveryCodes.usedAt)));
  return row?.left ?? 0;
}

export async function removeFactor(tx: Tx, userId: string): Promise<boolean> {
  await tx.db.delete(userRecoveryCodes).where(eq(userRecoveryCodes.userId, userId));
  const rows = await tx.db
    .delete(userSecondFactors)
    .where(eq(userSecondFactors.userId, userId))
    .returning({ userId: userSecondFactors.userId });
  return rows.length === 1;
}
