import { Redirect } from 'expo-router';
import { useMe } from '@/lib/hooks/use-me';
import { homePathForRole } from './nav-items';
import { SessionGate } from './session-gate';

function RoleHome() {
  const { data: me } = useMe();
  return me ? <Redirect href={homePathForRole(me.role)} /> : null;
}

/** "/" sends signed-out people to sign-in and everyone else to their role's first tab. */
export function HomeRedirect() {
  return (
    <SessionGate require="signed-in">
      <RoleHome />
    </SessionGate>
  );
}
