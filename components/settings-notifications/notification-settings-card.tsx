import { Platform, StyleSheet, Switch, View } from 'react-native';
import { colors, spacing } from '@/constants/theme';
import { Card, ErrorText, Txt } from '@/components/ui';
import { errorMessage } from '@/hooks/api/client';
import { useNotificationSettings, useSaveNotificationSettings } from '@/hooks/api/use-notification-settings';
import { useCurrentClub } from '@/hooks/use-current-club';
import { NOTIFICATION_LABELS, type NotificationKind } from '@/shared/schemas';

/**
 * The review e-mails the person receives in the current club, one switch per kind their role gets.
 * Saved on the server (each person, each club), so the choice follows them to every device.
 */
export function NotificationSettingsCard() {
  const { club } = useCurrentClub();
  const query = useNotificationSettings(club?.id);
  const save = useSaveNotificationSettings(club?.id ?? '');
  if (!club) return null;
  const data = query.data;
  const toggle = (kind: NotificationKind, on: boolean) => {
    if (data) save.mutate({ ...data.settings, [kind]: on });
  };
  return (
    <Card title="Notifications" testID="settings-notifications">
      <Txt variant="caption" color={colors.inkMuted}>
        E-mails about the safety review in {club.name}.
      </Txt>
      {query.isPending ? (
        <Txt testID="settings-notifications-loading">Loading your e-mail settings…</Txt>
      ) : query.isError ? (
        <ErrorText message={`Your e-mail settings could not be loaded: ${errorMessage(query.error)}`} testID="settings-notifications-load-error" />
      ) : data && data.forRole.length === 0 ? (
        <Txt testID="settings-notifications-none">Your role in this club receives no review e-mails.</Txt>
      ) : (
        data?.forRole.map((kind) => {
          const label = NOTIFICATION_LABELS[kind];
          const on = data.settings[kind];
          return (
            <View key={kind} style={styles.row}>
              <View style={styles.words}>
                <Txt variant="bodyStrong">{label.title}</Txt>
                <Txt variant="caption" color={colors.inkMuted}>
                  {label.hint}
                </Txt>
              </View>
              <Switch
                value={on}
                onValueChange={(v) => toggle(kind, v)}
                disabled={save.isPending}
                // Switch already says it is a switch and whether it is on (on the web, through its checkbox input).
                accessibilityLabel={`E-mail me: ${label.title}`}
                testID={`settings-notifications-${kind}`}
                trackColor={{ false: colors.line, true: colors.action }}
                thumbColor={colors.surface}
                style={styles.switch}
              />
            </View>
          );
        })
      )}
      <ErrorText message={save.isError ? `Not saved: ${errorMessage(save.error)}` : null} testID="settings-notifications-save-error" />
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.m, paddingVertical: spacing.s, minHeight: 48 },
  words: { flex: 1, gap: spacing.xxs },
  // The web switch is 20 px tall by default: too small for a thumb in a field. Native switches keep their own size.
  switch: Platform.select({ web: { height: 30 }, default: {} }),
});
