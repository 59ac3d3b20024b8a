import type { Action } from '../../shared/policy';

/** Whoever may read the batches works the brewing side and starts on the menu; everyone else starts on the tap list. */
export const BREWING_HOME: Action = 'batch.read';

export interface NavItem {
  to: string;
  label: string;
  /** The action its page needs (the same as in router.tsx). */
  action: Action;
  /** Shown only to whoever may also do this: the Taproom item is left out where the taproom is Home. */
  onlyWith?: Action;
}

/** What a page route carries in its `handle`: the policy action a person needs to open it (see router.tsx). */
export interface PageAccess {
  action: Action;
}

/** The action the deepest matched page needs, or null when no page names one. */
export function pageAction(matches: readonly { handle: unknown }[]): Action | null {
  for (let i = matches.length - 1; i >= 0; i--) {
    const handle = matches[i]!.handle as Partial<PageAccess> | undefined;
    if (handle?.action) return handle.action;
  }
  return null;
}

/** The menu: a person sees only what the policy lets them open. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Home', action: 'account.read' },
  { to: '/recipes', label: 'Recipes', action: 'recipe.read' },
  { to: '/library', label: 'Brewhouse', action: 'equipment.read' },
  { to: '/batches', label: 'Batches', action: 'batch.read' },
  { to: '/cellar', label: 'Cellar', action: 'cellar.read' },
  { to: '/reports/history', label: 'History', action: 'report.history.read' },
  { to: '/reports/production', label: 'Production', action: 'report.production.read' },
  { to: '/team', label: 'Team', action: 'team.manage' },
  { to: '/taproom', label: 'Taproom', action: 'taproom.read', onlyWith: BREWING_HOME },
  { to: '/settings', label: 'Settings', action: 'brewery.read' },
];

/** The menu items for a person, given what the policy lets them do (`usePermissions()`, or `can` with their role). */
export const navFor = (may: (action: Action) => boolean) =>
  NAV_ITEMS.filter((item) => may(item.action) && (!item.onlyWith || may(item.onlyWith)));
