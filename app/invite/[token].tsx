import { useLocalSearchParams } from 'expo-router';
import { InviteScreen } from '@/components/auth/invite-screen';

export default function InviteRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <InviteScreen token={String(token ?? '')} />;
}
