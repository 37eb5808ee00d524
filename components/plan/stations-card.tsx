import { useState } from 'react';
import { View } from 'react-native';
import { Button, Card, ListRow, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useMemberRoster, type MemberRoster } from '@/hooks/plan/use-member-roster';
import { useCurrentClub } from '@/hooks/use-current-club';
import { useUnits } from '@/hooks/use-units';
import type { Coax, Station } from '@/shared/schemas';
import { CoaxForm } from './coax-form';
import { StationForm } from './station-form';

/** Who crews a station, in words: the named people (from the member list this device has), or that none is named. */
export function crewWords(station: Pick<Station, 'crewMemberIds'>, roster: MemberRoster): string {
  const ids = station.crewMemberIds;
  if (ids.length === 0) return 'Crew: none named (every crew member gets its sheets)';
  const names = ids.map((id) => roster.members?.find((m) => m.userId === id)?.displayName).filter((n): n is string => !!n);
  const unknown = ids.length - names.length;
  return `Crew: ${[...names, ...(unknown > 0 ? [unknown === ids.length ? `${unknown} named` : `${unknown} more`] : [])].join(', ')}`;
}

/** The event's stations and the club's coax, with forms to add and change them (lead and admin). */
export function StationsCard({ eventId, stations, coax, canPlan }: { eventId: string; stations: Station[]; coax: Coax[]; canPlan: boolean }) {
  const { formatLengthM } = useUnits();
  const roster = useMemberRoster(useCurrentClub().club?.id);
  const [editing, setEditing] = useState<Station | 'new' | null>(null);
  const [addingCoax, setAddingCoax] = useState(false);
  return (
    <View>
      <Card
        title="Stations"
        testID="plan-stations"
        right={canPlan && !editing ? <Button label="Add station" icon="plus" variant="secondary" compact testID="station-add" onPress={() => setEditing('new')} /> : null}
      >
        {stations.length === 0 ? <Txt color={colors.inkMuted}>No stations yet. Add one for each transmitter at the event.</Txt> : null}
        {stations.map((s) => (
          <ListRow
            key={s.id}
            title={s.name}
            subtitle={`${s.bands.join(', ')} · ${s.mode.toUpperCase()} · ${s.powerW} W · ${s.purpose}\n${crewWords(s, roster)}`}
            icon="drafting"
            testID={`station-${s.id}`}
            onPress={canPlan ? () => setEditing(s) : undefined}
            accessibilityLabel={`Station ${s.name}, bands ${s.bands.join(', ')}, ${crewWords(s, roster)}${canPlan ? ', tap to change' : ''}`}
          />
        ))}
      </Card>
      {editing ? <StationForm key={editing === 'new' ? 'new' : editing.id} eventId={eventId} station={editing === 'new' ? undefined : editing} onDone={() => setEditing(null)} /> : null}
      <Card
        title="Coax inventory"
        testID="plan-coax"
        right={canPlan && !addingCoax ? <Button label="Add coax" icon="plus" variant="secondary" compact testID="coax-add" onPress={() => setAddingCoax(true)} /> : null}
      >
        {coax.length === 0 ? <Txt color={colors.inkMuted}>No coax recorded: the plan will say how much each antenna needs.</Txt> : null}
        <View style={{ gap: spacing.xs }}>
          {coax.map((c) => (
            <Txt key={c.id} testID={`coax-${c.id}`}>{c.label}: {c.type}, {formatLengthM(c.lengthM)}</Txt>
          ))}
        </View>
      </Card>
      {addingCoax ? <CoaxForm onDone={() => setAddingCoax(false)} /> : null}
    </View>
  );
}
