// Synchroniser-token CSRF protection: the token lives in the session; every state-changing request
// must carry it in the X-CSRF-Token header. Safe methods pass.
import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { DomainError } from '../../shared/errors';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export function csrfToken(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

export class CsrfError extends DomainError {
  constructor() {
    super('csrf_failed', 'The form expired or came from elsewhere: reload the page and try again');
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const given = req.get('x-csrf-token');
  if (!expected || !given) return next(new CsrfError());
  const a = Buffer.from(expected);
  const b = Buffer.from(given);
  if (a.length !== b.length || !timingSafeEqual(a, b)) return next(new CsrfError());
  next();
};
