import { useState } from 'react';
import { View } from 'react-native';
import { Badge, Button, Card, ListRow, Txt } from '@/components/ui';
import { SYNC_STATE_LOOK } from '@/constants/states';
import { colors, spacing } from '@/constants/theme';
import { crewWords } from '@/hooks/plan/crew-words';
import { useMemberRoster } from '@/hooks/plan/use-member-roster';
import { useRecordSyncState } from '@/hooks/sync';
import { useCurrentClub } from '@/hooks/use-current-club';
import { useUnits } from '@/hooks/use-units';
import type { Coax, Station } from '@/shared/schemas';
import { CoaxForm } from './coax-form';
import { StationForm } from './station-form';

/** A station change the server refused (e.g. a crew naming someone outside the club) says so on its row. */
function StationRefused({ id }: { id: string }) {
  if (useRecordSyncState('stations', id) !== 'rejected') return null;
  return <Badge look={SYNC_STATE_LOOK.rejected} label="Not accepted: see Changes to check" testID={`station-refused-${id}`} />;
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
            subtitle={`${s.bands.join(', ')} · ${s.mode.toUpperCase()} · ${s.powerW} W · ${s.purpose}\n${crewWords(s, roster.members)}`}
            icon="drafting"
            testID={`station-${s.id}`}
            onPress={canPlan ? () => setEditing(s) : undefined}
            accessibilityLabel={`Station ${s.name}, bands ${s.bands.join(', ')}, ${crewWords(s, roster.members)}${canPlan ? ', tap to change' : ''}`}
            right={<StationRefused id={s.id} />}
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
