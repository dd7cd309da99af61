import { AppError } from './errors';

// SQLSTATE classes and codes that say "the database is not there right now", not "your request was wrong":
// 08 connection exception, 57P01-57P03 shutdown / crash / not accepting connections yet, 57014 a statement
// cancelled by statement_timeout, 25P03 a transaction ended by idle_in_transaction_session_timeout, 53300 too many
// connections.
const unavailableCodes = new Set(['57P01', '57P02', '57P03', '57014', '25P03', '53300']);
const socketCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EAI_AGAIN',
]);
// What pg and pg-pool say, without a code, when a connection dies, cannot be had in time, or a read times out.
const driverMessages = [
  /Connection terminated/i,
  /timeout exceeded when trying to connect/i,
  /Query read timeout/i,
  /Client has encountered a connection error/i,
  /Connection closed/i,
  /not queryable/i,
];

/** True when an error (or what it wraps, as Drizzle does) means the database cannot be reached or did not answer. */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (
    let e = error as { code?: unknown; message?: unknown; cause?: unknown } | undefined, i = 0;
    e && i < 4;
    e = e.cause as typeof e, i += 1
  ) {
    const code = typeof e.code === 'string' ? e.code : '';
    if (unavailableCodes.has(code) || code.startsWith('08') || socketCodes.has(code)) return true;
    if (typeof e.message === 'string' && driverMessages.some((m) => m.test(e!.message as string))) return true;
  }
  return false;
}

export const databaseUnavailable = () =>
  new AppError(
    503,
    'database_unavailable',
    'The database is not answering right now, so this could not be done. Please try again in a moment.',
  );
