import type { Membership, Session } from '@tumblewise/shared';

/** Invented workspaces for the unit tests. */
export const HARBOUR_WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
export const RIDGE_WORKSPACE = {
  id: '0a9b8c7d-6e5f-4a3b-9c2d-1e0f9a8b7c6d',
  name: 'Ridgeline Throwing Club',
  state: 'active' as const,
  createdAt: '2026-11-20T09:00:00.000Z',
};

/** A session for tests: one invented user, token and memberships as given. */
export function sessionFixture(overrides: Partial<Session> = {}, memberships?: Membership[]): Session {
  return {
    accessToken: 'token-one',
    expiresIn: 900,
    user: {
      id: '5e4d3c2b-1a09-4f8e-b7d6-c5b4a3928170',
      email: 'mira.okafor@example.test',
      name: 'Mira Okafor',
      isOperator: false,
      createdAt: '2026-11-02T09:00:00.000Z',
    },
    memberships: memberships ?? [{ workspace: HARBOUR_WORKSPACE, role: 'owner' }],
    ...overrides,
  };
}
