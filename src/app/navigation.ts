import { BREWING_ROLES, ROLES, type Role } from '../../shared/schemas/roles';

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

export const ALL: readonly Role[] = ROLES;
export const BREWING: readonly Role[] = BREWING_ROLES;
export const HEAD: readonly Role[] = ['head_brewer'];

/** What a page route carries in its `handle`: the roles that may open it (see router.tsx). */
export interface PageAccess {
  roles: readonly Role[];
}

/** The roles the deepest matched page allows, or null when no page asks (every signed-in person may open it). */
export function pageRoles(matches: readonly { handle: unknown }[]): readonly Role[] | null {
  for (let i = matches.length - 1; i >= 0; i--) {
    const handle = matches[i]!.handle as Partial<PageAccess> | undefined;
    if (handle?.roles) return handle.roles;
  }
  return null;
}

/** The menu, by role: a person sees only what their role may open. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Home', roles: ALL },
  { to: '/recipes', label: 'Recipes', roles: BREWING },
  { to: '/library', label: 'Brewhouse', roles: BREWING },
  { to: '/batches', label: 'Batches', roles: BREWING },
  { to: '/cellar', label: 'Cellar', roles: BREWING },
  { to: '/reports/history', label: 'History', roles: BREWING },
  { to: '/reports/production', label: 'Production', roles: HEAD },
  { to: '/team', label: 'Team', roles: HEAD },
  // The taproom manager's Home is the taproom itself.
  { to: '/taproom', label: 'Taproom', roles: BREWING },
  { to: '/settings', label: 'Settings', roles: ALL },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role));
