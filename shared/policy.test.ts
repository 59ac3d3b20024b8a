import { describe, expect, it } from 'vitest';
import { ROLES } from './schemas/roles';
import { ACTIONS, POLICY, can, rolesFor } from './policy';
import { PINNED_POLICY } from '../tests/policy-pinned';

describe('access policy', () => {
  it('is exactly the reviewed table, action by action and role by role', () => {
    // Roles compared as sets, so the table may list them in any order.
    const normalise = (table: Record<string, unknown>) =>
      Object.fromEntries(Object.entries(table).map(([a, r]) => [a, Array.isArray(r) ? [...r].sort() : r]));
    expect(normalise(POLICY)).toEqual(normalise(PINNED_POLICY));
  });

  it('answers can() from the table for every role and for nobody signed in', () => {
    for (const action of ACTIONS) {
      const rule = PINNED_POLICY[action];
      if (rule === undefined) throw new Error(`${action} is missing from tests/policy-pinned.ts`);
      expect([action, can(null, action)]).toEqual([action, rule === 'public']);
      for (const role of ROLES)
        expect([action, role, can(role, action)]).toEqual([
          action,
          role,
          typeof rule === 'string' || rule.includes(role),
        ]);
      expect(rolesFor(action)).toEqual(ROLES.filter((role) => can(role, action)));
    }
  });
});
