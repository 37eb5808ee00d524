import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/constants/theme';
import { Button, EmptyState, Screen } from '@/components/ui';
import { useSession } from '@/hooks/auth/use-session';
import { SignOutButton } from './sign-out-button';

/** A signed-in person who belongs to no club yet: start one, or use the invitation link a club sent. */
export function NoClubScreen() {
  const router = useRouter();
  const { user } = useSession();
  return (
    <Screen title={`Welcome${user ? `, ${user.displayName}` : ''}`} narrow testID="no-club">
      <EmptyState
        icon="people"
        title="You are not in a club yet"
        body="Loftline plans a club's field day together. Start a club and invite the others, or open the invitation link your club's admin e-mailed you."
        action={<Button label="Start a club" icon="plus" testID="no-club-create" onPress={() => router.navigate('/club/new')} />}
      />
      <View style={styles.row}>
        <Button label="Settings" icon="gear" variant="quiet" testID="no-club-settings" onPress={() => router.navigate('/settings')} />
        <SignOutButton variant="quiet" testID="no-club-sign-out" />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s, marginTop: spacing.l } });
