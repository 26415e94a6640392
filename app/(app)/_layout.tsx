import { Slot } from 'expo-router';
import { SignedInShell } from '@/lib/ui/signed-in-shell';

export default function AppLayout() {
  return (
    <SignedInShell>
      <Slot />
    </SignedInShell>
  );
}
