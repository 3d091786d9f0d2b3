import { mayOpenPage } from './page-access';

describe('mayOpenPage', () => {
  it('lets only operators open the platform pages, whatever their workspace role', () => {
    expect(mayOpenPage({ operator: true }, 'owner', false)).toBe(false);
    expect(mayOpenPage({ operator: true }, null, true)).toBe(true);
  });

  it('follows the role table for workspace pages: admins read billing, only owners would change it', () => {
    expect(mayOpenPage({ permission: 'billing.read' }, 'admin', false)).toBe(true);
    expect(mayOpenPage({ permission: 'billing.read' }, 'designer', false)).toBe(false);
    expect(mayOpenPage({ permission: 'settings.manage' }, 'reviewer', false)).toBe(false);
  });

  it('keeps pages without a rule for the roles that manage the workspace, operators included only as members', () => {
    expect(mayOpenPage(undefined, 'admin', false)).toBe(true);
    expect(mayOpenPage(undefined, 'reviewer', false)).toBe(false);
    expect(mayOpenPage(undefined, null, true)).toBe(false);
  });
});
