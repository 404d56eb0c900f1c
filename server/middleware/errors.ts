// The one error contract: { error: { code, message, details } }. No stack trace leaves the server.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { DomainError } from '../../shared/errors';
import { DATABASE_RETRY_AFTER_S, isDatabaseUnavailable } from '../db/unavailable';

const STATUS: Record<string, number> = {
  validation_failed: 400,
  bad_json: 400,
  unauthenticated: 401,
  forbidden: 403,
  csrf_failed: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_file: 415,
  outside_table: 422,
  too_many_requests: 429,
};

/** The answer while PostgreSQL cannot be reached: the request did nothing, and may be repeated. */
export const DATABASE_UNAVAILABLE_MESSAGE =
  'The database is unreachable, so nothing was read or saved. The server reconnects by itself; try again in a few seconds.';

export const notFoundApi: RequestHandler = (req, res) => {
  res
    .status(404)
    .json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.originalUrl.split('?')[0]}`, details: null } });
};

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) {
    res.end();
    return;
  }
  if (err instanceof DomainError) {
    res.status(STATUS[err.code] ?? 400).json({ error: { code: err.code, message: err.message, details: err.details } });
    return;
  }
  const e = err as { type?: string; status?: number; code?: string; message?: string };
  if (e?.type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'bad_json', message: 'The request body is not valid JSON', details: null } });
    return;
  }
  if (e?.type === 'entity.too.large' || e?.code === 'LIMIT_FILE_SIZE') {
    res.status(413).json({ error: { code: 'payload_too_large', message: 'The upload or request body is too large', details: null } });
    return;
  }
  if (e?.code && String(e.code).startsWith('LIMIT_')) {
    res.status(400).json({
      error: {
        code: 'validation_failed',
        message: e.message ?? 'Upload refused',
        details: [{ path: 'file', message: e.message ?? 'Upload refused' }],
      },
    });
    return;
  }
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    res.status(e.status).json({ error: { code: 'bad_request', message: e.message ?? 'Bad request', details: null } });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    console.warn(`[database] ${req.method} ${req.path}: unreachable (${err instanceof Error ? err.message : String(err)})`);
    res.setHeader('Retry-After', String(DATABASE_RETRY_AFTER_S));
    res.status(503).json({
      error: {
        code: 'database_unavailable',
        message: DATABASE_UNAVAILABLE_MESSAGE,
        details: { retryAfterSeconds: DATABASE_RETRY_AFTER_S },
      },
    });
    return;
  }
  console.error(`[error] ${req.method} ${req.path}:`, err instanceof Error ? err.message : err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server', details: null } });
};
