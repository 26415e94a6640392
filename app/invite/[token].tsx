import { useLocalSearchParams } from 'expo-router';
import { InvitationView } from '@/lib/ui/invitation-view';

export default function Invite() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <InvitationView token={token} />;
}
