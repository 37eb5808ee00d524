import { useState } from 'react';
import { View } from 'react-native';
import { Button, Card, ListRow, Txt } from '@/components/ui';
import { colors, spacing } from '@/constants/theme';
import { useUnits } from '@/hooks/use-units';
import type { Coax, Station } from '@/shared/schemas';
import { CoaxForm } from './coax-form';
import { StationForm } from './station-form';

/** The event's stations and the club's coax, with forms to add and change them (lead and admin). */
export function StationsCard({ eventId, stations, coax, canPlan }: { eventId: string; stations: Station[]; coax: Coax[]; canPlan: boolean }) {
  const { formatLengthM } = useUnits();
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
            subtitle={`${s.bands.join(', ')} · ${s.mode.toUpperCase()} · ${s.powerW} W · ${s.purpose}`}
            icon="drafting"
            testID={`station-${s.id}`}
            onPress={canPlan ? () => setEditing(s) : undefined}
            accessibilityLabel={`Station ${s.name}, bands ${s.bands.join(', ')}${canPlan ? ', tap to change' : ''}`}
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
