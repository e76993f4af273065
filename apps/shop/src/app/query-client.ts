import { QueryClient } from '@tanstack/react-query';
import { shouldRetry } from '@fryline/ui/api-client';

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 15_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}
