import { useLocalSearchParams } from 'expo-router';
import { RequestInvitationView } from '@/lib/ui/requests/request-invitation-view';

export default function RequestInvite() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <RequestInvitationView token={token} />;
}
