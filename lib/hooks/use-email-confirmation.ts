import { useEffect, useRef, useState } from 'react';
import { useSWRConfig } from 'swr';
import { confirmEmail } from '@/lib/api/auth';
import { ApiError } from '@/lib/api/client';
import { isFirmScopedKey } from '@/lib/api/keys';

type Confirmation = { state: 'working' } | { state: 'done' } | { state: 'failed'; error: ApiError };

/**
 * Confirms the e-mail address with the link's token once per page (the link works only once, so a second
 * call would report it spent), then refreshes the signed-in person so the shell's notice goes.
 */
export function useEmailConfirmation(token: string | undefined): Confirmation {
  const { mutate } = useSWRConfig();
  const [result, setResult] = useState<Confirmation>({ state: 'working' });
  const sent = useRef<string | null>(null);

  useEffect(() => {
    if (!token || sent.current === token) return;
    sent.current = token;
    confirmEmail(token).then(
      async () => {
        setResult({ state: 'done' });
        await mutate(isFirmScopedKey);
      },
      (error: unknown) => {
        if (!(error instanceof ApiError)) throw error;
        setResult({ state: 'failed', error });
      },
    );
  }, [token, mutate]);

  return result;
}
