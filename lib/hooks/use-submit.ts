import { useCallback, useState } from 'react';
import { ApiError } from '@/lib/api/client';

/**
 * Runs a mutation and keeps its state for a form: `busy` while it runs, the {@link ApiError} it failed
 * with (shown by the form). Errors that are not API errors are programming faults and are rethrown.
 */
export function useSubmit<A extends unknown[], R>(action: (...args: A) => Promise<R>) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);

  const run = useCallback(
    async (...args: A): Promise<{ ok: true; value: R } | { ok: false; error: ApiError }> => {
      setBusy(true);
      setError(null);
      try {
        const value = await action(...args);
        return { ok: true, value };
      } catch (caught) {
        if (!(caught instanceof ApiError)) throw caught;
        setError(caught);
        return { ok: false, error: caught };
      } finally {
        setBusy(false);
      }
    },
    [action],
  );

  return { run, busy, error, clearError: () => setError(null) };
}
