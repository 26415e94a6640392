import type { Middleware } from 'swr';
import { ApiError } from '@/lib/api/client';
import { isFirmScopedKey } from '@/lib/api/keys';
import { device } from './device';

const isNetwork = (error: unknown) => error instanceof ApiError && error.code === 'network';

/** Keys whose answers the device keeps: the firm's records and the signed-in person (not sessions). */
const deviceKey = (key: unknown): string | null =>
  isFirmScopedKey(key) && Array.isArray(key) && key[0] !== 'sessions' ? JSON.stringify(key) : null;

/**
 * SWR middleware: every answer of a firm key is kept in the person's device database, and when the server
 * cannot be reached the device's copy answers instead. Changes still waiting in the outbox show over both.
 */
export const deviceCache: Middleware = (useSWRNext) => (key, fetcher, config) => {
  const stored = deviceKey(key);
  const wrapped: typeof fetcher =
    fetcher && stored
      ? async (...args) => {
          try {
            const data = await fetcher(...args);
            await device.remember(stored, data);
            return device.overlay(stored, data) as typeof data;
          } catch (error) {
            if (!isNetwork(error)) throw error;
            const kept = await device.recall(stored);
            if (kept === undefined) throw error;
            return device.overlay(stored, kept) as Awaited<ReturnType<typeof fetcher>>;
          }
        }
      : fetcher;
  return useSWRNext(key, wrapped, config);
};
