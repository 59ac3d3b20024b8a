import { toNestErrors } from '@hookform/resolvers';
import type { FieldError, FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { QUANTITIES, limitMessage, type UnitSystem } from '../../shared/quantities';
import { issueMessage, issueRefusal } from '../../shared/quantities/field';

/**
 * A react-hook-form resolver for a shared schema that words every refused limit in the brewery's units
 * ("must be at most 212 °F"). A limit's message in each unit the field may show sits in the error's `types`,
 * keyed by the unit's symbol, for a field that lets the person choose (SG or °P, gal or bbl).
 */
export function quantityResolver<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  system: UnitSystem,
): Resolver<z.input<S>, unknown, z.output<S>> {
  return async (values, _context, options) => {
    const result = await schema.safeParseAsync(values);
    if (result.success) return { values: result.data, errors: {} };
    const flat: Record<string, FieldError> = {};
    for (const issue of result.error.issues) {
      const path = issue.path.join('.');
      if (flat[path]) continue;
      const refusal = issueRefusal(issue);
      flat[path] = {
        type: issue.code,
        message: issueMessage(issue, system),
        ...(refusal && {
          types: Object.fromEntries(
            QUANTITIES[refusal.quantity].units[system].map((u) => [u.unit, limitMessage(refusal, system, u)]),
          ),
        }),
      };
    }
    return { values: {}, errors: toNestErrors(flat, options) };
  };
}
