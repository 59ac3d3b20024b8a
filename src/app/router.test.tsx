import { describe, expect, it } from 'vitest';
import { router } from './router';
import { NAV_ITEMS, pageRoles } from './navigation';

describe('page access', () => {
  const signedIn = router.routes.find((r) => r.path === '/')!.children![0]!.children!;

  it('every signed-in page names the roles that may open it', () => {
    const missing = signedIn.filter((r) => !pageRoles([{ handle: r.handle }])?.length).map((r) => r.path ?? '(home)');
    expect(missing).toEqual([]);
  });

  it('the taproom manager may open the taproom screens and not the head brewer’s', () => {
    const roles = (path: string) =>
      pageRoles([{ handle: undefined }, { handle: signedIn.find((r) => r.path === path)!.handle }]);
    expect(roles('taproom/board')).toContain('taproom_manager');
    expect(roles('team')).toEqual(['head_brewer']);
    expect(roles('batches/:batchId/tasting')).not.toContain('taproom_manager');
    expect(roles('reports/production')).toEqual(['head_brewer']);
  });

  it('no menu item leads a role to a page it may not open', () => {
    for (const item of NAV_ITEMS) {
      const path = item.to === '/' ? undefined : item.to.slice(1);
      const route = signedIn.find((r) => (path === undefined ? r.index : r.path === path))!;
      const refused = item.roles.filter((role) => !pageRoles([{ handle: route.handle }])!.includes(role));
      expect([item.to, refused]).toEqual([item.to, []]);
    }
  });
});
