import { Pressable, StyleSheet, View } from 'react-native';
import { Icon, Txt } from '@/components/ui';
import { colors, radii, spacing } from '@/constants/theme';
import type { MemberRoster } from '@/hooks/plan/use-member-roster';
import type { Member, Role } from '@/shared/schemas';

const ROLE_WORDS: Record<Role, string> = { admin: 'admin', lead: 'lead', safety: 'safety officer', scout: 'scout', crew: 'crew' };

export const NO_CREW_NAMED_HINT = 'No crew named: when a spot of this station is cleared, every crew member of the club gets its sheet e-mail.';

/**
 * Who raises this station's antennas: the club's members, crew first (any member may be picked: leads often raise
 * antennas too). The choice is never dropped for want of a list: people already chosen stay chosen (and can be
 * taken off) even when the member list is not on this device or no longer names them.
 */
export function CrewPicker({ roster, value, onChange }: { roster: MemberRoster; value: string[]; onChange: (ids: string[]) => void }) {
  const toggle = (id: string) => onChange(value.includes(id) ? value.filter((x) => x !== id) : [...value, id]);
  const members = roster.members ?? [];
  const known = new Set(members.map((m) => m.userId));
  const missing = value.filter((id) => !known.has(id));
  return (
    <View testID="station-crew" accessibilityLabel="Crew for this station">
      <Txt variant="label">Crew who raise its antennas</Txt>
      {roster.members === undefined ? (
        <Txt variant="caption" color={colors.warning} testID="station-crew-offline">
          {roster.loading ? 'Loading the club’s members…' : 'The member list needs a connection (it has not been on this device yet).'}
          {value.length > 0 ? ` The ${value.length === 1 ? 'person' : `${value.length} people`} already chosen stay${value.length === 1 ? 's' : ''} chosen.` : ''}
        </Txt>
      ) : roster.cachedAt ? (
        <Txt variant="caption" color={colors.inkMuted} testID="station-crew-cached">
          Member list as this device last saw it ({roster.cachedAt.slice(0, 16).replace('T', ' ')} UTC).
        </Txt>
      ) : null}
      <View style={styles.chips}>
        {members.map((m) => (
          <Chip key={m.userId} on={value.includes(m.userId)} onPress={() => toggle(m.userId)} member={m} />
        ))}
        {missing.map((id, i) => (
          <Chip key={id} on onPress={() => toggle(id)} missingIndex={i + 1} id={id} />
        ))}
      </View>
      {value.length === 0 ? (
        <Txt variant="caption" color={colors.inkMuted} testID="station-crew-none">{NO_CREW_NAMED_HINT}</Txt>
      ) : null}
    </View>
  );
}

function Chip({ on, onPress, member, missingIndex, id }: { on: boolean; onPress: () => void; member?: Member; missingIndex?: number; id?: string }) {
  const name = member ? member.displayName || member.email : `Chosen person ${missingIndex} (name not on this device)`;
  const role = member && member.role !== 'crew' ? ROLE_WORDS[member.role] : null;
  const userId = member?.userId ?? id!;
  return (
    <Pressable
      onPress={onPress}
      accessibilityRole="checkbox"
      accessibilityState={{ checked: on }}
      aria-checked={on}
      accessibilityLabel={`Crew: ${name}${role ? `, ${role}` : ''}`}
      testID={`station-crew-${userId}`}
      style={[styles.chip, on && styles.chipOn]}
    >
      {on ? <Icon name="check-circle" size={18} color={colors.onAction} /> : null}
      <View style={styles.chipText}>
        <Txt variant="label" color={on ? colors.onAction : colors.action}>{name}</Txt>
        {role ? <Txt variant="caption" color={on ? colors.onAction : colors.inkMuted}>{role}</Txt> : null}
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.s, marginVertical: spacing.s },
  chip: {
    minHeight: 48,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    borderWidth: 1.5,
    borderColor: colors.action,
    borderRadius: radii.m,
    paddingHorizontal: spacing.m,
    paddingVertical: spacing.xs,
    maxWidth: '100%',
  },
  chipOn: { backgroundColor: colors.action },
  // Long names wrap inside the chip instead of running off a phone screen.
  chipText: { flexShrink: 1 },
});
