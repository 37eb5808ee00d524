import { useState } from 'react';
import { View } from 'react-native';
import { Button, TextField, Txt } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useRecordSave } from '@/hooks/survey/use-record-save';
import type { PositionState } from '@/hooks/survey/use-position';
import type { OperatingPosition } from '@/shared/schemas';
import { PlacementPicker, type Placement } from '../placement/placement-picker';
import { FormFooter } from './form-footer';
import { checkPosition } from './site-form-logic';

/** Where the tents, tables and generator can go: each station's coax runs from here. */
export function PositionForm({ siteId, position, existing, onDone }: { siteId: string; position: PositionState; existing?: OperatingPosition; onDone: (id: string | null) => void }) {
  const { busy, saveError, run, upsert, append } = useRecordSave();
  const [label, setLabel] = useState(existing?.label ?? '');
  const [notes, setNotes] = useState(existing?.notes ?? '');
  const [moving, setMoving] = useState(!existing);
  const [placement, setPlacement] = useState<Placement | null>(null);
  const lat = moving ? placement?.lat ?? null : existing!.lat;
  const lon = moving ? placement?.lon ?? null : existing!.lon;
  const check = checkPosition({ label, lat, lon, notes }, siteId);

  const save = () => run(async () => {
    if (!check.fields) return;
    const id = await upsert('operatingPositions', existing, check.fields, check.fields.label);
    if (moving && placement) {
      await append('measurements', { siteId, subjectCollection: 'operatingPositions', subjectId: id, kind: 'gps-fix', method: placement.measurement.method, inputs: placement.measurement.inputs, valueM: placement.measurement.valueM, takenAt: new Date().toISOString(), takenBy: null });
    }
    onDone(id);
  });

  return (
    <View testID="position-form">
      <Txt variant="title" style={{ marginBottom: spacing.m }}>{existing ? `Edit ${existing.label}` : 'New operating position'}</Txt>
      <TextField label="Label" testID="position-label" value={label} onChangeText={setLabel} error={label ? check.errors.label : undefined} hint="For example “Tent A, by the shelter”" />
      {moving ? (
        <PlacementPicker position={position} value={placement} onChange={setPlacement} testID="position-place" what="the operating position" />
      ) : (
        <View style={{ marginBottom: spacing.l }}><Button label="Move it" testID="position-move" variant="secondary" compact onPress={() => setMoving(true)} /></View>
      )}
      <TextField label="Notes" testID="position-notes" multiline value={notes} onChangeText={setNotes} error={check.errors.notes} hint="Flat ground? Shade? Room for the generator downwind?" />
      <FormFooter testID="position" questions={check.questions} blockers={Object.values(check.errors)} saveError={saveError} canSave={!!check.fields && !busy} busy={busy} onSave={save} onCancel={() => onDone(null)} />
    </View>
  );
}
