import type { ApiErrorCode } from '@/shared/errors';

/**
 * What services throw when a request cannot be served. It names the API error code, not an HTTP status;
 * the error handler maps codes to statuses.
 */
export class AppError extends Error {
  constructor(
    public readonly code: ApiErrorCode,
    message: string,
    public readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} not found`);
