import type { ApiError } from '@/lib/api/client';

/** Field messages to show: the client's own checks first, then what the server's 400 answer named. */
export function mergeFieldErrors(
  client: Record<string, string[]>,
  server: ApiError | null,
): Record<string, string[]> {
  return { ...(server?.fields ?? {}), ...client };
}
