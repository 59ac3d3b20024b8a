/**
 * For react-hook-form's setValueAs: an empty field is "not given", anything else a number for the schema
 * to check. A decimal comma ("1,012", "18,5") is read as a decimal point, as on the brew-day screen.
 */
export const optionalNumber = (v: unknown) =>
  v === '' || v === null || v === undefined
    ? undefined
    : Number(typeof v === 'string' ? v.trim().replace(',', '.') : v);
