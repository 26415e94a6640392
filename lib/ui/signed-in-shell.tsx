import type { ReactNode } from 'react';
import { useMe } from '@/lib/hooks/use-me';
import { AppShell } from './app-shell';
import { SessionGate } from './session-gate';

function ShellWithMe({ children }: { children: ReactNode }) {
  const { data: me } = useMe();
  return me ? <AppShell me={me}>{children}</AppShell> : null;
}

/** Signed-in pages: sign-in redirect on 401, then the navigation shell around the page. */
export function SignedInShell({ children }: { children: ReactNode }) {
  return (
    <SessionGate require="signed-in">
      <ShellWithMe>{children}</ShellWithMe>
    </SessionGate>
  );
}
