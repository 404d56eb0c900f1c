// Whether an error means the database cannot be reached (stopped, restarting, network cut), as
// opposed to a fault in the request or the code. The error middleware answers those with 503 and a
// Retry-After, whichever layer met them first: Sequelize (repositories), node-postgres directly (the
// session store, the change feed) or passport's deserialisation of the signed-in person.
import { ConnectionError as SequelizeConnectionError } from 'sequelize';

/** Seconds a client should wait before asking again while the database is unreachable. */
export const DATABASE_RETRY_AFTER_S = 5;

/** Socket errors of a connection that could not be made or was cut. */
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN', 'EPIPE']);

/**
 * PostgreSQL SQLSTATEs of an unavailable server: class 08 (connection exception), 57P01–57P03
 * (admin or crash shutdown, "the database system is starting up / shutting down"), 53300 (too many
 * connections).
 */
function unavailableSqlState(code: string): boolean {
  return /^08[0-9A-Z]{3}$/.test(code) || code === '57P01' || code === '57P02' || code === '57P03' || code === '53300';
}

/** node-postgres's own messages for a connection lost or never made. */
const PG_MESSAGES = [
  /connection terminated/i,
  /timeout exceeded when trying to connect/i,
  /client has encountered a connection error/i,
  /connection (is )?not open/i,
  /Client was closed and is not queryable/i,
];

export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (!err || typeof err !== 'object' || depth > 4) return false;
  if (err instanceof SequelizeConnectionError) return true; // ConnectionRefusedError, ConnectionAcquireTimeoutError, HostNotReachableError …
  const e = err as {
    name?: unknown;
    code?: unknown;
    message?: unknown;
    parent?: unknown;
    original?: unknown;
    cause?: unknown;
    errors?: unknown;
  };
  if (
    typeof e.name === 'string' &&
    /^Sequelize(Connection|ConnectionRefused|ConnectionAcquireTimeout|ConnectionTimedOut|HostNotReachable|HostNotFound|InvalidConnection)Error$/.test(
      e.name,
    )
  )
    return true;
  if (typeof e.code === 'string' && (SOCKET_CODES.has(e.code) || unavailableSqlState(e.code))) return true;
  if (typeof e.message === 'string' && PG_MESSAGES.some((re) => re.test(e.message as string))) return true;
  if (Array.isArray(e.errors) && e.errors.some((x) => isDatabaseUnavailable(x, depth + 1))) return true; // AggregateError of a dual-stack connect
  return [e.parent, e.original, e.cause].some((inner) => inner !== err && isDatabaseUnavailable(inner, depth + 1));
}
