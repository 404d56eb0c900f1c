// The mocked network layer for the client tests (msw): the API answers a test needs, as the server sends them.
import { setupServer } from 'msw/node';
import { http, HttpResponse } from 'msw';
import type { CurrentUser } from '../../shared/schemas/auth';

/** the CSRF token every state-changing request asks for first (src/lib/api-client.ts) */
export const csrfHandler = http.get('/api/auth/csrf', () => HttpResponse.json({ token: 'test-csrf-token' }));

export const server = setupServer(csrfHandler);

export const meHandler = (user: CurrentUser | null) =>
  http.get('/api/auth/me', () =>
    user
      ? HttpResponse.json(user)
      : HttpResponse.json({ error: { code: 'unauthenticated', message: 'Sign in first', details: null } }, { status: 401 }),
  );

/** the error body of server/middleware/errors.ts */
export const apiError = (status: number, code: string, message: string, details: unknown = null) =>
  HttpResponse.json({ error: { code, message, details } }, { status });
