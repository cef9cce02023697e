import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api/client.js';

/** Client errors (not found, no access, bad input) are answers, not hiccups: never retry them. */
export const createQueryClient = (): QueryClient =>
  new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 10_000,
        retry: (count, error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2,
      },
    },
  });
