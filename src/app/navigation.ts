import type { Role } from '../../shared/schemas/roles';

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

const ALL: readonly Role[] = ['head_brewer', 'assistant_brewer', 'taproom_manager'];

/** The menu, by role: a person sees only what their role may open. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Home', roles: ALL },
  { to: '/recipes', label: 'Recipes', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/library', label: 'Brewhouse', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/batches', label: 'Batches', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/cellar', label: 'Cellar', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/reports/history', label: 'History', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/reports/production', label: 'Production', roles: ['head_brewer'] },
  { to: '/team', label: 'Team', roles: ['head_brewer'] },
  // The taproom manager's Home is the taproom itself.
  { to: '/taproom', label: 'Taproom', roles: ['head_brewer', 'assistant_brewer'] },
  { to: '/settings', label: 'Settings', roles: ALL },
];

export const navFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role));
