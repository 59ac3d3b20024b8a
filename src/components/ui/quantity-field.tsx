import { useState, type ReactNode } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { TextField } from './field';
import { displayUnit, type DisplayUnit, type QuantityId, type UnitSystem } from '../../../shared/quantities';

interface Props<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  quantity: QuantityId;
  system: UnitSystem;
  /** Another of the quantity's units the person chose (bbl beside gal, °P beside SG); default the brewery's first. */
  unit?: DisplayUnit;
  optional?: boolean;
  disabled?: boolean;
  hint?: ReactNode;
  className?: string;
}

/**
 * A number the form holds in SI, typed and shown in the brewery's unit (°F, gal, lb, oz, psi or °C, L, kg, g, kPa).
 * With `quantityResolver`, a refused limit reads in the unit the field shows ("must be at most 212 °F").
 */
export function QuantityField<T extends FieldValues>({
  control,
  name,
  label,
  quantity,
  system,
  unit,
  optional,
  disabled,
  hint,
  className,
}: Props<T>) {
  const { field, fieldState } = useController({ control, name });
  const u = unit ?? displayUnit(quantity, system);
  // While the person types, keep their text (e.g. "12.") rather than re-formatting it under the cursor.
  const [text, setText] = useState<string | null>(null);
  const value = field.value as unknown;
  const shown =
    text ??
    (typeof value === 'number' && Number.isFinite(value) ? String(Number(u.fromSi(value).toFixed(u.decimals))) : '');
  const error = fieldState.error;
  const inUnit = error?.types?.[u.unit];
  return (
    <TextField
      label={u.unit ? `${label} (${u.unit})` : label}
      inputMode="decimal"
      autoComplete="off"
      value={shown}
      disabled={disabled}
      hint={hint}
      className={className}
      name={field.name}
      ref={field.ref}
      onChange={(e) => {
        const raw = e.target.value;
        setText(raw);
        const n = Number(raw.replace(',', '.'));
        field.onChange(
          raw.trim() === '' ? (optional ? undefined : Number.NaN) : Number.isFinite(n) ? u.toSi(n) : Number.NaN,
        );
      }}
      onBlur={() => {
        setText(null);
        field.onBlur();
      }}
      error={typeof inUnit === 'string' ? inUnit : error?.message}
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
