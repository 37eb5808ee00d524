import { useRouter } from 'expo-router';
import { Button, Screen, Txt } from '@/components/ui';

/** Crews work from the sheets; the plan and the review are for the lead and the safety officer. */
export function RoleNotice({ eventId }: { eventId: string }) {
  const router = useRouter();
  return (
    <Screen title="For the lead and the safety officer" narrow testID="role-notice">
      <Txt>As crew you work from the antenna sheets: one per antenna cleared to raise.</Txt>
      <Button label="Open the sheets" icon="clipboard" testID="role-notice-sheets" onPress={() => router.navigate(`/events/${eventId}/sheets`)} />
    </Screen>
  );
}
