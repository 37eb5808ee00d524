import { useRouter } from 'expo-router';
import { Button, EmptyState, Screen } from '@/components/ui';

export function NotFoundScreen() {
  const router = useRouter();
  return (
    <Screen title="Page not found" narrow testID="not-found">
      <EmptyState
        icon="map-pin"
        title="Nothing is at this address"
        body="The link may be old, or the page belongs to a part of Loftline this server does not have."
        action={<Button label="Go to the events" testID="not-found-home" onPress={() => router.replace('/')} />}
      />
    </Screen>
  );
}
