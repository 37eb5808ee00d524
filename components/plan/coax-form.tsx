import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button, Card, ErrorText, NumberField, Select, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useMutate } from '@/hooks/sync';
import { useUnits } from '@/hooks/use-units';
import { COAX_TYPES, coaxFieldsSchema } from '@/shared/schemas';
import { fieldErrors } from './issue-text';

/** Add a piece of coax to the club's inventory (label, cable type and length). */
export function CoaxForm({ onDone }: { onDone: () => void }) {
  const mutate = useMutate();
  const { lengthToM, lengthUnit } = useUnits();
  const [label, setLabel] = useState('');
  const [type, setType] = useState<(typeof COAX_TYPES)[number]>('RG-213');
  const [length, setLength] = useState<number | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = async () => {
    const lengthM = length === null || Number.isNaN(length) ? undefined : Math.round(lengthToM(length) * 100) / 100;
    const parsed = coaxFieldsSchema.safeParse({ label, type, lengthM, notes: '' });
    if (!parsed.success) return setErrors(fieldErrors(parsed.error));
    try {
      await mutate.create('coax', parsed.data);
      onDone();
    } catch (err) {
      setErrors({ form: err instanceof Error ? err.message : String(err) });
    }
  };
  return (
    <Card title="New coax piece" testID="coax-form">
      <TextField label="Label" testID="coax-label" value={label} onChangeText={setLabel} error={errors.label} />
      <Select label="Cable" testID="coax-type" options={COAX_TYPES.map((t) => ({ value: t, label: t }))} value={type} onChange={setType} />
      <NumberField label="Length" suffix={lengthUnit} testID="coax-length" value={length} onChange={setLength} error={errors.lengthM} />
      {errors.form ? <ErrorText boxed message={errors.form} testID="coax-form-error" /> : null}
      <View style={styles.actions}>
        <Button label="Add coax" testID="coax-save" onPress={save} />
        <Button label="Cancel" variant="quiet" testID="coax-cancel" onPress={onDone} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: spacing.s, marginTop: spacing.m } });
