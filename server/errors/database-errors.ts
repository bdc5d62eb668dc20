/** True when an error means the database cannot be reached or is restarting (answer 503). */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (!error || typeof error !== 'object') return false;
  const e = error as { code?: string; message?: string; driverError?: unknown };
  if (e.driverError && isDatabaseUnavailable(e.driverError)) return true;
  const code = e.code ?? '';
  if (
    ['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENOTFOUND'].includes(code)
  )
    return true;
  // 08xxx connection exceptions; 57P01-57P03 admin shutdown, crash shutdown, cannot connect now.
  if (/^08/.test(code) || ['57P01', '57P02', '57P03'].includes(code)) return true;
  const message = e.message ?? '';
  return /Connection terminated|timeout exceeded when trying to connect|Query read timeout|connect ECONNREFUSED|Client has encountered a connection error|Connection ended unexpectedly|terminating connection/i.test(
    message,
  );
}

/** PostgreSQL's SQLSTATE of an error, when it carries one. */
export function sqlState(error: unknown): string | undefined {
  const e = error as { code?: string; driverError?: { code?: string } } | undefined;
  return e?.driverError?.code ?? e?.code;
}
