/** For react-hook-form's setValueAs: an empty field is "not given", anything else a number for the schema to check. */
export const optionalNumber = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v));
