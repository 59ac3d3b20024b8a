import { ROLES, type Role } from './schemas/roles';

/**
 * Who may do what: the one access policy. API routes, pages, the menu and every control read it;
 * no other code compares roles.
 *
 * A rule is 'public' (anyone, signed in or not), 'signed-in' (anyone of the brewery), or the roles that may.
 */
export type Rule = 'public' | 'signed-in' | readonly Role[];

/** The head brewer alone: responsible for recipes, plans, sign-offs, releases and the team. */
const head = ['head_brewer'] as const;
/** The brewing side: recipes, batch logs and the cellar (not the taproom manager). */
const brewing = ['head_brewer', 'assistant_brewer'] as const;

export const POLICY = {
  // Signing in and out, and the links sent by e-mail: before anyone is known.
  'account.signIn': 'public',
  'account.signUp': 'public',
  'account.signOut': 'public',
  'account.resetPassword': 'public',
  'account.acceptInvite': 'public',
  'account.read': 'signed-in',
  'account.changePassword': 'signed-in',

  'brewery.read': 'signed-in',
  'brewery.edit': head,
  'team.manage': head,

  'recipe.read': brewing,
  'recipe.edit': head,
  'equipment.read': brewing,
  'equipment.edit': head,
  'ingredient.read': brewing,
  'ingredient.edit': head,

  'batch.read': brewing,
  'batch.plan': head,
  'batch.changeStatus': brewing,
  // Dumping is final and writes off the beer: the head brewer, who is responsible for the batch, decides it.
  'batch.dump': head,
  'batch.moveToVessel': brewing,
  'batch.logEntry': brewing,
  'batch.signOff': head,

  // A batch's photos and lab sheets; 'file.readShown' lets everyone else fetch a photo the taproom shows.
  'file.read': brewing,
  'file.readShown': 'signed-in',
  'file.upload': brewing,
  'file.remove': head,

  'vessel.read': brewing,
  'vessel.edit': head,
  'vessel.clean': brewing,

  'cellar.read': brewing,
  'cellar.plan': head,
  'cellar.logReading': brewing,
  'cellar.logAction': brewing,
  'cellar.logPackaging': brewing,
  // Cellar alerts: read in the app and e-mailed to these roles. The assistant brewer takes most readings and
  // does the cellar work the alerts call for (start the D-rest, check a stalled tank), so both brewers see them.
  'cellar.alerts': brewing,

  'report.production.read': head,
  'report.history.read': brewing,

  'taproom.read': 'signed-in',
  'release.read': brewing,
  'release.manage': head,
  'tasting.read': brewing,
  'tasting.write': brewing,
} as const satisfies Record<string, Rule>;

export type Action = keyof typeof POLICY;

export const ACTIONS = Object.keys(POLICY) as Action[];

/** Whether a person of this role (null: nobody signed in) may do the action. */
export function can(role: Role | null | undefined, action: Action): boolean {
  const rule: Rule = POLICY[action];
  if (rule === 'public') return true;
  if (!role) return false;
  return rule === 'signed-in' || rule.includes(role);
}

/** The roles that may do the action once signed in (every role for a 'public' or 'signed-in' action). */
export function rolesFor(action: Action): readonly Role[] {
  return ROLES.filter((role) => can(role, action));
}
