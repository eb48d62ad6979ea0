/** Drizzle wraps driver errors; the PostgreSQL fields are on the error or its cause. */
export function pgError(error: unknown): { code?: string; constraint?: string } {
  const e = error as { code?: string; constraint?: string; cause?: unknown };
  if (e?.code) return e;
  return (e?.cause as { code?: string; constraint?: string }) ?? {};
}

export const isUniqueViolation = (error: unknown, constraint: string) => {
  const e = pgError(error);
  return e.code === '23505' && e.constraint === constraint;
};
