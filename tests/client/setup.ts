// The client project: each test renders a screen with a fresh QueryClient; msw answers its requests.
// A request no handler answers fails the test (onUnhandledRequest: 'error'), so a test names every call it expects.
import { afterAll, afterEach, beforeAll } from 'vitest';
import { cleanup } from '@testing-library/react';
import { server } from './server';

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  server.resetHandlers();
});
afterAll(() => server.close());
