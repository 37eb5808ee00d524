import { useEffect, useState } from 'react';
import { TextField, type TextFieldProps } from './text-field';

type Props = Omit<TextFieldProps, 'value' | 'onChangeText' | 'keyboardType' | 'onChange'> & {
  value: number | null | undefined;
  /** null when empty; NaN when the text is not a number (the form's schema then refuses it). */
  onChange: (value: number | null) => void;
  /** Digits to show when the value comes from outside (a stored height, a GPS fix). */
  digits?: number;
};

/** Accepts "12.5" and "12,5"; shows figures in the mono face. */
export function parseNumberText(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (t === '') return null;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return Number(t);
}

export function NumberField({ value, onChange, digits, error, ...rest }: Props) {
  const format = (v: number | null | undefined) => (v === null || v === undefined || Number.isNaN(v) ? '' : digits === undefined ? String(v) : v.toFixed(digits));
  const [text, setText] = useState(() => format(value));
  useEffect(() => {
    // Follow outside changes (a "use my position" fix) without fighting the person's own typing.
    const parsed = parseNumberText(text);
    if (value !== undefined && value !== null && !Number.isNaN(value) && parsed !== value) setText(format(value));
  }, [value]);
  const parsed = parseNumberText(text);
  const localError = parsed !== null && Number.isNaN(parsed) ? 'enter a number, such as 12.5' : undefined;
  return (
    <TextField
      {...rest}
      mono
      inputMode="decimal"
      keyboardType="decimal-pad"
      value={text}
      error={localError ?? error}
      onChangeText={(t) => {
        setText(t);
        onChange(parseNumberText(t));
      }}
    />
  );
}
