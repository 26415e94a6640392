import type { z } from 'zod';
import { ApiError } from '@/lib/api/client';
import { apiErrorBodySchema } from '@/shared/errors';
import { device } from './device';
import type { DeviceWriteBuilder } from './device-session';
import type { NewOutboxItem, StoredBlob } from './outbox-types';

/** What became of a write: the server's answer, or the device's copy while the change waits. */
export type QueuedWrite<T> =
  { state: 'sent'; data: T } | { state: 'waiting'; data: T | undefined; conflict: boolean };

/** The record's `version` when it has one: edits carry it as `baseVersion` (docs/sync-protocol.md). */
export function versionOf(record: unknown): number | undefined {
  const version = (record as { version?: unknown } | null | undefined)?.version;
  return typeof version === 'number' ? version : undefined;
}

/** An edit's body with `baseVersion` when the record has a version; none otherwise (last writer wins). */
export function withBaseVersion<B extends object>(body: B, record: unknown): B & { baseVersion?: number } {
  const baseVersion = versionOf(record);
  return baseVersion === undefined ? body : { ...body, baseVersion };
}

/** The device's copy after an edit it queued: one version on, so a second offline edit bases on the first. */
export function nextVersion<R extends object>(record: R): R {
  const version = versionOf(record);
  return version === undefined ? record : { ...record, version: version + 1 };
}

function refused(status: number, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (!parsed.success) return new ApiError('bad_response', status, `The server refused it (${status}).`);
  const { code, message, fields } = parsed.data.error;
  return new ApiError(code, status, message, fields);
}

/**
 * Sends one write through the device's queue. Online, the server's answer (parsed with `schema`) comes back;
 * with no network (or a server that cannot answer now) the change waits on the device and its
 * `localRecord` shows in the record's page and list. A refusal (4xx other than 409) throws the server's
 * {@link ApiError}, so field messages show at the form and nothing is kept. Given a builder, the write is
 * made inside the queue's lock from the device's newest copy (see {@link DeviceWriteBuilder}).
 */
export async function queueWrite<S extends z.ZodType>(
  schema: S,
  item: NewOutboxItem | DeviceWriteBuilder,
  blob?: StoredBlob,
): Promise<QueuedWrite<z.infer<S>>> {
  const result = await device.submit(item, blob);
  if (result.state === 'sent') {
    const parsed = schema.safeParse(result.body);
    if (!parsed.success)
      throw new ApiError('bad_response', 200, 'The server’s answer was not in the expected form.');
    return { state: 'sent', data: parsed.data };
  }
  if (result.state === 'rejected') throw refused(result.status, result.body);
  return {
    state: 'waiting',
    data: result.item.localRecord as z.infer<S> | undefined,
    conflict: result.state === 'conflict',
  };
}

/** A serialised SWR key, as the device store and the outbox name records. */
export const cacheKey = (key: readonly unknown[]) => JSON.stringify(key);
