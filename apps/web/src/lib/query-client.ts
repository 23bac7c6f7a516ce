import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

// A 4xx answer will not change on a retry; a dropped connection or a 5xx might.
const worthRetrying = (failureCount: number, error: unknown): boolean =>
  failureCount < 2 && !(error instanceof ApiError && error.status >= 400 && error.status < 500);

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: worthRetrying },
      mutations: { retry: false },
    },
  });
}
