import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SWRConfig, type SWRConfiguration } from 'swr';
import { ApiError } from '@/lib/api/client';
import { useFieldMode } from '@/lib/hooks/use-field-mode';
import { deviceCache } from '@/lib/offline/swr-device-cache';
import { UpdateNotice } from './offline/update-notice';

/**
 * A 4xx answer will not change by asking again; everything else is retried a few times. Every firm answer
 * is kept on the person's device and answers for the server when there is no network.
 */
const swrConfig: SWRConfiguration = {
  use: [deviceCache],
  onErrorRetry: (error, _key, _config, revalidate, { retryCount }) => {
    if (error instanceof ApiError && error.status >= 400 && error.status < 500) return;
    if (retryCount >= 3) return;
    setTimeout(() => revalidate({ retryCount }), 2000 * 2 ** retryCount);
  },
};

/** Data cache, field mode (device store, queue, service worker) and safe-area insets for the whole app. */
export function AppProviders({ children }: { children: ReactNode }) {
  const updateWaiting = useFieldMode();
  return (
    <SafeAreaProvider>
      <SWRConfig value={swrConfig}>
        {children}
        {updateWaiting ? <UpdateNotice /> : null}
      </SWRConfig>
    </SafeAreaProvider>
  );
}
