import { isApiError } from '@/lib/api-client';

/** Plain words for any thrown value: the server's message for an ApiError, a general line otherwise. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  return 'Something went wrong in the page itself. Reload it; if it happens again, tell your administrator.';
}
