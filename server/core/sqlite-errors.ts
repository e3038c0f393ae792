/** better-sqlite3 raises SqliteError with a `code` such as SQLITE_CONSTRAINT_UNIQUE. */
export function isUniqueViolation(err: unknown): boolean {
  return typeof err === 'object' && err !== null && 'code' in err && (err as { code: unknown }).code === 'SQLITE_CONSTRAINT_UNIQUE';
}
