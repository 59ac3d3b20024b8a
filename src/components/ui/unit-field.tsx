import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TextField } from './field';
import { UNITS, type Quantity } from '../../lib/units';
import type { UnitSystem } from '../../../shared/schemas/auth';

interface Props<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  quantity: Quantity;
  system: UnitSystem;
  optional?: boolean;
  disabled?: boolean;
}

/** A number stored in SI, typed and shown in the brewery's units (lb, oz, °F, gal or kg, g, °C, L). */
export function UnitField<T extends FieldValues>({ control, name, label, quantity, system, optional, disabled }: Props<T>) {
  const { field, fieldState } = useController({ control, name });
  const u = UNITS[system][quantity];
  // While the person types, keep their text (e.g. "12.") rather than re-formatting it under the cursor.
  const [text, setText] = useState<string | null>(null);
  const value = field.value as unknown;
  const shown = text ?? (typeof value === 'number' && Number.isFinite(value) ? String(Number(u.toDisplay(value).toFixed(u.decimals))) : '');
  return (
    <TextField
      label={`${label} (${u.unit})`}
      inputMode="decimal"
      value={shown}
      disabled={disabled}
      name={field.name}
      ref={field.ref}
      onChange={(e) => {
        const raw = e.target.value;
        setText(raw);
        const n = Number(raw.replace(',', '.'));
        field.onChange(raw.trim() === '' ? (optional ? undefined : Number.NaN) : Number.isFinite(n) ? u.fromDisplay(n) : Number.NaN);
      }}
      onBlur={() => {
        setText(null);
        field.onBlur();
      }}
      error={fieldState.error?.message}
    />
  );
}

/** Parses a plain number input for react-hook-form: empty becomes undefined (optional fields) or NaN (required ones, so zod says "enter a number"). */
export const asNumber = (optional = false) => ({
  setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? (optional ? undefined : Number.NaN) : Number(String(v).replace(',', '.'))),
});
