import { Slot } from 'expo-router';
import { SessionGate } from '@/lib/ui/session-gate';

export default function AuthLayout() {
  return (
    <SessionGate require="signed-out">
      <Slot />
    </SessionGate>
  );
}
