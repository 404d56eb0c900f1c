import passport from 'passport';
import rateLimit from 'express-rate-limit';
import type { RequestHandler } from 'express';
import { defineRoute } from '../../http/route-table';
import { AcceptInviteSchema, SignInSchema, type CurrentUser } from '../../../shared/schemas/auth';
import { DomainError, UnauthenticatedError } from '../../../shared/errors';
import { csrfToken } from '../../middleware/csrf';
import { acceptInvite } from '../users/service';
import { env } from '../../config/env';

class TooManyAttempts extends DomainError {
  constructor() {
    super('too_many_requests', 'Too many failed sign-ins: wait 15 minutes and try again');
  }
}

export function signInLimiter(): RequestHandler {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: env().PW_SIGNIN_LIMIT,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `${req.ip}|${String((req.body as { email?: unknown })?.email ?? '').toLowerCase()}`,
    handler: (_req, _res, next) => next(new TooManyAttempts()),
    validate: { keyGeneratorIpFallback: false },
  });
}

function authenticate(req: Parameters<RequestHandler>[0], res: Parameters<RequestHandler>[1]): Promise<{ id: number } | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', (err: unknown, user: { id: number } | false) => (err ? reject(err) : resolve(user)))(
      req,
      res,
      () => undefined,
    );
  });
}

export function authRoutes(limiter: RequestHandler) {
  return [
    defineRoute({ method: 'get', path: '/api/health', access: 'public', summary: 'Liveness', handler: () => ({ ok: true }) }),
    defineRoute({
      method: 'get',
      path: '/api/auth/csrf',
      access: 'public',
      summary: 'The CSRF token for this session',
      handler: ({ req }) => ({ token: csrfToken(req) }),
    }),
    defineRoute({
      method: 'post',
      path: '/api/auth/sign-in',
      access: 'public',
      summary: 'Sign in with e-mail and password',
      before: [limiter],
      body: SignInSchema,
      status: 200,
      handler: async ({ req, res }) => {
        const found = await authenticate(req, res);
        if (!found) throw new UnauthenticatedError('That e-mail and password do not match an active account');
        // passport 0.7 regenerates the session on login: a new session id at every sign-in.
        await new Promise<void>((resolve, reject) => req.logIn(found, (err) => (err ? reject(err) : resolve())));
        return { token: csrfToken(req) };
      },
    }),
    defineRoute({
      method: 'post',
      path: '/api/auth/sign-out',
      access: 'signed-in',
      summary: 'Sign out',
      handler: async ({ req, res }) => {
        await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
        await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
        res.clearCookie('pw.sid');
        return undefined;
      },
    }),
    defineRoute({
      method: 'get',
      path: '/api/auth/me',
      access: 'signed-in',
      summary: 'The signed-in person',
      handler: ({ user }) => user satisfies CurrentUser,
    }),
    defineRoute({
      method: 'post',
      path: '/api/auth/accept-invite',
      access: 'public',
      summary: 'Set a password from an invitation',
      before: [limiter],
      body: AcceptInviteSchema,
      status: 200,
      handler: ({ body }) => acceptInvite(body.token, body.password),
    }),
  ];
}
