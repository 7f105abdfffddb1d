import { QueryClient } from '@tanstack/react-query';
import { isApiError } from '@/modules/api/utils/apiError';

/** Answers that will not change by asking again. */
const FINAL_CODES = ['UNAUTHENTICATED', 'FORBIDDEN', 'NOT_FOUND', 'BAD_USER_INPUT', 'GRAPHQL_VALIDATION_FAILED'] as const;

/** The one query cache of the app. */
export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      retry: (failureCount, error) => failureCount < 2 && !isApiError(error, ...FINAL_CODES),
      refetchOnWindowFocus: false,
    },
    mutations: {
      retry: false,
    },
  },
});
