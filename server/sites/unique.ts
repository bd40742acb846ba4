// SQLite's UNIQUE failures, recognised so that a race between two saves still answers 409, not 500.
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; message?: string } | null;
  return !!e && (e.code === 'SQLITE_CONSTRAINT_UNIQUE' || /UNIQUE constraint failed/.test(e.message ?? ''));
}
