import { StyleSheet, View } from 'react-native';
import type { IconName } from '@/constants/icons';
import { colors, radii, spacing } from '@/constants/theme';
import { Icon } from './icon';
import { Txt } from './text';

type Props = { icon: IconName; title: string; body?: string; action?: React.ReactNode; testID?: string };

/** What a list says when it has nothing yet, and the one thing to do about it. */
export function EmptyState({ icon, title, body, action, testID }: Props) {
  return (
    <View style={styles.box} testID={testID}>
      <Icon name={icon} size={40} color={colors.brandInk} />
      <Txt variant="title" align="center">
        {title}
      </Txt>
      {body ? (
        <Txt color={colors.inkMuted} align="center" style={styles.body}>
          {body}
        </Txt>
      ) : null}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: spacing.m,
    padding: spacing.xl,
    borderWidth: 2,
    borderStyle: 'dashed',
    borderColor: colors.line,
    borderRadius: radii.l,
    backgroundColor: colors.surface,
  },
  body: { maxWidth: 420 },
});
