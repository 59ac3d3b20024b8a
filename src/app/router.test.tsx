import { describe, expect, it } from 'vitest';
import { router } from './router';
import { NAV_ITEMS, navFor, pageAction } from './navigation';
import { can, rolesFor } from '../../shared/policy';
import { ROLES } from '../../shared/schemas/roles';

describe('page access', () => {
  const signedIn = router.routes.find((r) => r.path === '/')!.children![0]!.children!;
  const actionOf = (path: string | undefined) =>
    pageAction([{ handle: signedIn.find((r) => (path === undefined ? r.index : r.path === path))!.handle }]);

  it('every signed-in page names the policy action it needs', () => {
    const missing = signedIn.filter((r) => !pageAction([{ handle: r.handle }])).map((r) => r.path ?? '(home)');
    expect(missing).toEqual([]);
  });

  it('the taproom manager may open the taproom screens and not the head brewer’s', () => {
    const roles = (path: string) => rolesFor(actionOf(path)!);
    expect(roles('taproom/board')).toContain('taproom_manager');
    expect(roles('team')).toEqual(['head_brewer']);
    expect(roles('batches/:batchId/tasting')).not.toContain('taproom_manager');
    expect(roles('reports/production')).toEqual(['head_brewer']);
  });

  it('no menu item leads a role to a page it may not open', () => {
    for (const role of ROLES) {
      const may = (action: Parameters<typeof can>[1]) => can(role, action);
      for (const item of navFor(may)) {
        const page = actionOf(item.to === '/' ? undefined : item.to.slice(1));
        expect([role, item.to, page && may(page)]).toEqual([role, item.to, true]);
      }
    }
  });

  it('every menu item opens the page it names', () => {
    for (const item of NAV_ITEMS)
      expect([item.to, actionOf(item.to === '/' ? undefined : item.to.slice(1))]).toEqual([item.to, item.action]);
  });

  it('the taproom is Home for a role that does not work the batches, and a menu item for everyone else', () => {
    const menu = (role: (typeof ROLES)[number]) => navFor((a) => can(role, a)).map((i) => i.to);
    expect(menu('taproom_manager')).toEqual(['/', '/settings']);
    expect(menu('assistant_brewer')).toContain('/taproom');
  });
});
