import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SWRConfig, type SWRConfiguration } from 'swr';
import { ApiError } from '@/lib/api/client';

/** A 4xx answer will not change by asking again; everything else is retried a few times. */
const swrConfig: SWRConfiguration = {
  onErrorRetry: (error, _key, _config, revalidate, { retryCount }) => {
    if (error instanceof ApiError && error.status >= 400 && error.status < 500) return;
    if (retryCount >= 3) return;
    setTimeout(() => revalidate({ retryCount }), 2000 * 2 ** retryCount);
  },
};

/** Data cache and safe-area insets for the whole app. */
export function AppProviders({ children }: { children: ReactNode }) {
  return (
    <SafeAreaProvider>
      <SWRConfig value={swrConfig}>{children}</SWRConfig>
    </SafeAreaProvider>
  );
}
