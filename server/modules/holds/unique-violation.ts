/** True when a Postgres unique index refused the write (the driver error may be wrapped by the ORM). */
export function isUniqueViolation(err: unknown, indexName?: string): boolean {
  for (let e = err as { code?: string; constraint?: string; message?: string; cause?: unknown } | undefined; e; e = e.cause as typeof e) {
    if (e.code === '23505') return !indexName || e.constraint === indexName || (e.message ?? '').includes(indexName);
  }
  return false;
}
