import { QueryClient } from '@tanstack/react-query';
import { ApiError, isDatabaseUnavailable } from './api-client';

/** How long the app keeps asking again while the database is unreachable before it shows the error in the page. */
const DATABASE_RETRY_FOR_MS = 2 * 60_000;

export function makeQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 15_000,
        retry: (count, err) => {
          // the database is away: nothing was read, ask again (at the server's Retry-After) for a while
          if (isDatabaseUnavailable(err)) return count * (err.retryAfterSeconds ?? 5) * 1000 < DATABASE_RETRY_FOR_MS;
          return !(err instanceof ApiError && err.status < 500) && count < 2;
        },
        retryDelay: (count, err) =>
          isDatabaseUnavailable(err) ? (err.retryAfterSeconds ?? 5) * 1000 : Math.min(1000 * 2 ** count, 30_000),
        refetchOnWindowFocus: false,
      },
    },
  });
}

export const queryClient = makeQueryClient();
