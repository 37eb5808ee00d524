import { Controller, type Control, type FieldPath, type FieldValues } from 'react-hook-form';
import { NumberField } from './number-field';
import { Select, type SelectOption } from './select';
import { TextField, type TextFieldProps } from './text-field';

/*
 * The UI kit's fields bound to react-hook-form. Forms use zodResolver with the shared schemas and
 * mode "onChange", so a field's plain-words error appears (and clears) as the person types.
 */

type Base<T extends FieldValues> = { control: Control<T>; name: FieldPath<T>; serverError?: string };

export function FormTextField<T extends FieldValues>({ control, name, serverError, ...rest }: Base<T> & Omit<TextFieldProps, 'value' | 'onChangeText'>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          {...rest}
          value={(field.value as string | undefined) ?? ''}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message ?? serverError}
        />
      )}
    />
  );
}

export function FormNumberField<T extends FieldValues>({
  control,
  name,
  serverError,
  ...rest
}: Base<T> & Omit<TextFieldProps, 'value' | 'onChangeText' | 'onChange'> & { digits?: number }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <NumberField
          {...rest}
          value={field.value as number | null}
          onChange={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message ?? serverError}
        />
      )}
    />
  );
}

export function FormSelect<T extends FieldValues, V extends string>({
  control,
  name,
  serverError,
  label,
  testID,
  options,
}: Base<T> & { label: string; testID: string; options: readonly SelectOption<V>[] }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <Select label={label} testID={testID} options={options} value={field.value as V} onChange={field.onChange} error={fieldState.error?.message ?? serverError} />
      )}
    />
  );
}
