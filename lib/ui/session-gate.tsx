import { Redirect, useLocalSearchParams, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { useMe } from '@/lib/hooks/use-me';
import { colors, spacing } from '@/lib/theme';
import { ErrorView } from './error-view';
import { LoadingView } from './loading-view';
import { homePathForRole } from './nav-items';
import { safeNextPath } from './safe-next-path';

type SessionGateProps = {
  /** `signed-in`: sends signed-out people to sign-in. `signed-out`: sends signed-in people on to the app. */
  require: 'signed-in' | 'signed-out';
  children: ReactNode;
};

const isSignedOut = (error: unknown) => error instanceof ApiError && error.status === 401;

/** Lets a screen render only for the session state it is meant for. */
export function SessionGate({ require, children }: SessionGateProps) {
  const { data: me, error, mutate } = useMe();
  const { next } = useLocalSearchParams<{ next?: string }>();
  const pathname = usePathname();

  if (require === 'signed-out') {
    if (me) return <Redirect href={safeNextPath(next) ?? homePathForRole(me.role)} />;
    if (error) return <>{children}</>;
    return <LoadingView />;
  }

  if (me) return <>{children}</>;
  if (isSignedOut(error)) {
    return (
      <Redirect href={pathname === '/' ? '/sign-in' : { pathname: '/sign-in', params: { next: pathname } }} />
    );
  }
  if (error) {
    return (
      <View style={styles.center}>
        <ErrorView error={error} onRetry={() => mutate()} />
      </View>
    );
  }
  return <LoadingView />;
}

const styles = StyleSheet.create({
  center: { flex: 1, justifyContent: 'center', padding: spacing.lg, backgroundColor: colors.paper },
});
