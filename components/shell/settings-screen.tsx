import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Card, Select, Screen, Tabular, Txt } from '@/components/ui';
import { SignOutButton } from './sign-out-button';
import { NotificationSettingsCard } from '@/components/settings-notifications/notification-settings-card';
import { useSession } from '@/hooks/auth/use-session';
import { useCurrentClub } from '@/hooks/use-current-club';
import { useUnits } from '@/hooks/use-units';
import { ROLE_LABELS } from '@/shared/schemas';

export function SettingsScreen() {
  const { user } = useSession();
  const { clubs } = useCurrentClub();
  const units = useUnits();
  const router = useRouter();
  return (
    <Screen title="Settings" narrow testID="settings">
      <Card title="Units">
        <Select
          label="Show lengths and heights in"
          testID="settings-units"
          options={[
            { value: 'metric', label: 'Metres' },
            { value: 'imperial', label: 'Feet' },
          ]}
          value={units.system}
          onChange={units.setSystem}
        />
        <Txt variant="caption" color={colors.inkMuted}>
          Loftline keeps every length in metres and converts on screen (1 ft = 0.3048 m). Example: a 12.5 m support shows as{' '}
          <Tabular size={14} testID="settings-units-example">
            {units.formatLengthM(12.5)}
          </Tabular>
          .
        </Txt>
      </Card>
      <NotificationSettingsCard />
      {user ? (
        <Card title="You">
          <Txt variant="bodyStrong">
            {user.displayName}
            {user.callSign ? ` · ${user.callSign}` : ''}
          </Txt>
          <Txt color={colors.inkMuted}>{user.email}</Txt>
          <View style={styles.clubs}>
            {clubs.map((c) => (
              <Txt key={c.id} variant="caption">
                {c.name}: {ROLE_LABELS[c.role]}
              </Txt>
            ))}
          </View>
        </Card>
      ) : null}
      <SignOutButton testID="settings-sign-out" />
      <Txt variant="caption" color={colors.inkMuted} style={styles.note}>
        Testing without a mail account? Invitations and reset links land in the{' '}
        <Txt variant="caption" color={colors.action} onPress={() => router.navigate('/mailbox')} testID="settings-mailbox" accessibilityRole="link">
          dev mailbox
        </Txt>
        .
      </Txt>
    </Screen>
  );
}

const styles = StyleSheet.create({
  clubs: { marginTop: spacing.s, gap: spacing.xxs },
  note: { marginTop: spacing.xl },
});
