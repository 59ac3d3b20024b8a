// The access policy as reviewed, spelled out role by role. shared/policy.test.ts holds shared/policy.ts to it,
// and the API role matrix (tests/api/roles.test.ts) computes every route's expected answer from it, so
// adding or removing a role anywhere in the policy fails until this table is changed on purpose too.
import type { Role } from '../shared/schemas/roles';

type PinnedRule = 'public' | 'signed-in' | Role[];

export const PINNED_POLICY: Record<string, PinnedRule> = {
  'account.signIn': 'public',
  'account.signUp': 'public',
  'account.signOut': 'public',
  'account.resetPassword': 'public',
  'account.acceptInvite': 'public',
  'account.read': 'signed-in',
  'account.changePassword': 'signed-in',

  'brewery.read': 'signed-in',
  'brewery.edit': ['head_brewer'],
  'team.manage': ['head_brewer'],

  'recipe.read': ['head_brewer', 'assistant_brewer'],
  'recipe.edit': ['head_brewer'],
  'equipment.read': ['head_brewer', 'assistant_brewer'],
  'equipment.edit': ['head_brewer'],
  'ingredient.read': ['head_brewer', 'assistant_brewer'],
  'ingredient.edit': ['head_brewer'],

  'batch.read': ['head_brewer', 'assistant_brewer'],
  'batch.plan': ['head_brewer'],
  'batch.changeStatus': ['head_brewer', 'assistant_brewer'],
  'batch.dump': ['head_brewer'],
  'batch.moveToVessel': ['head_brewer', 'assistant_brewer'],
  'batch.logEntry': ['head_brewer', 'assistant_brewer'],
  'batch.signOff': ['head_brewer'],

  'file.read': ['head_brewer', 'assistant_brewer'],
  'file.readShown': 'signed-in',
  'file.upload': ['head_brewer', 'assistant_brewer'],
  'file.remove': ['head_brewer'],

  'vessel.read': ['head_brewer', 'assistant_brewer'],
  'vessel.edit': ['head_brewer'],
  'vessel.clean': ['head_brewer', 'assistant_brewer'],

  'cellar.read': ['head_brewer', 'assistant_brewer'],
  'cellar.plan': ['head_brewer'],
  'cellar.logReading': ['head_brewer', 'assistant_brewer'],
  'cellar.logAction': ['head_brewer', 'assistant_brewer'],
  'cellar.logPackaging': ['head_brewer', 'assistant_brewer'],
  'cellar.alerts': ['head_brewer', 'assistant_brewer'],

  'report.production.read': ['head_brewer'],
  'report.history.read': ['head_brewer', 'assistant_brewer'],

  'taproom.read': 'signed-in',
  'release.read': ['head_brewer', 'assistant_brewer'],
  'release.manage': ['head_brewer'],
  'tasting.read': ['head_brewer', 'assistant_brewer'],
  'tasting.write': ['head_brewer', 'assistant_brewer'],
};

/** Whether the pinned table lets this caller ('signed-out' for nobody signed in) do the action. */
export function pinnedAllows(action: string, caller: Role | 'signed-out'): boolean {
  const rule = PINNED_POLICY[action];
  if (rule === undefined) throw new Error(`${action} is not in the pinned policy table`);
  if (rule === 'public') return true;
  if (caller === 'signed-out') return false;
  return rule === 'signed-in' || rule.includes(caller);
}
