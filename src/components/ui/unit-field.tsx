import { useState, type ReactNode } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TextField } from './field';
import { UNITS, limitInUnits, type Quantity } from '../../lib/units';
import type { UnitSystem } from '../../../shared/schemas/auth';

interface Props<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  quantity: Quantity;
  system: UnitSystem;
  optional?: boolean;
  disabled?: boolean;
  hint?: ReactNode;
}

/**
 * A number stored in SI, typed and shown in the brewery's units (lb, oz, °F, gal, qt/lb or kg, g, °C, L, L/kg);
 * its limit messages are restated in those units too.
 */
export function UnitField<T extends FieldValues>({
  control,
  name,
  label,
  quantity,
  system,
  optional,
  disabled,
  hint,
}: Props<T>) {
  const { field, fieldState } = useController({ control, name });
  const u = UNITS[system][quantity];
  // While the person types, keep their text (e.g. "12.") rather than re-formatting it under the cursor.
  const [text, setText] = useState<string | null>(null);
  const value = field.value as unknown;
  const shown =
    text ??
    (typeof value === 'number' && Number.isFinite(value) ? String(Number(u.toDisplay(value).toFixed(u.decimals))) : '');
  return (
    <TextField
      label={`${label} (${u.unit})`}
      inputMode="decimal"
      value={shown}
      disabled={disabled}
      hint={hint}
      name={field.name}
      ref={field.ref}
      onChange={(e) => {
        const raw = e.target.value;
        setText(raw);
        const n = Number(raw.replace(',', '.'));
        field.onChange(
          raw.trim() === '' ? (optional ? undefined : Number.NaN) : Number.isFinite(n) ? u.fromDisplay(n) : Number.NaN,
        );
      }}
      onBlur={() => {
        setText(null);
        field.onBlur();
      }}
      error={fieldState.error?.message && limitInUnits(fieldState.error.message, system, quantity)}
    />
  );
}

/** Parses a plain number input for react-hook-form: empty becomes undefined (optional fields) or NaN (required ones, so zod says "enter a number"). */
export const asNumber = (optional = false) => ({
  setValueAs: (v: unknown) =>
    v === '' || v === null || v === undefined
      ? optional
        ? undefined
        : Number.NaN
      : Number(typeof v === 'string' ? v.replace(',', '.') : v),
});
