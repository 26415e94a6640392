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
    /** With `version_conflict`: the record as its GET answers it. */
    public readonly current?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} not found`);

/** An edit made on `current.version`'s predecessor: nothing is written and the record now is sent back. */
export const versionConflict = (what: string, current: { version: number } | unknown) =>
  new AppError(
    'version_conflict',
    `${what} was changed elsewhere since this edit was made: compare and choose`,
    undefined,
    current,
  );

/** A client id another record holds; nothing about that record is said. */
export const idTaken = () =>
  new AppError('id_taken', 'That id is already used: make the record with a new id');
