import { healthView } from './platform-health';

describe('healthView', () => {
  it('reads the operator answer: services, figures by group, status from the services', () => {
    const view = healthView({
      services: { database: 'up', mail: 'down', payment: 'up' },
      workspacesByState: { active: 4, suspended: 1 },
      studies: {},
      process: { uptimeSeconds: 120, rssMegabytes: 180 },
    });
    expect(view.status).toBe('degraded');
    expect(view.services).toEqual([
      { name: 'Database', value: 'up', up: true },
      { name: 'Mail server', value: 'down', up: false },
      { name: 'Payment provider', value: 'up', up: true },
    ]);
    expect(view.groups.map((g) => [g.title, g.lines.map((l) => `${l.name}=${l.value}`)])).toEqual([
      ['Workspaces by state', ['Active=4', 'Suspended=1']],
      ['Scatter studies in the queue', []],
      ['Server process', ['Uptime (s)=120', 'Memory (MB)=180']],
    ]);
  });

  it('reads the public answer with its own status and time', () => {
    const view = healthView({ status: 'ok', database: 'up', mail: 'up', payment: 'up', checkedAt: '2026-11-20T09:00:00.000Z' });
    expect(view.status).toBe('ok');
    expect(view.checkedAt).toBe('2026-11-20T09:00:00.000Z');
    expect(view.services).toHaveLength(3);
    expect(view.groups).toEqual([]);
  });

  it('is unavailable when the database is down', () => {
    expect(healthView({ services: { database: 'down', mail: 'up', payment: 'up' } }).status).toBe('unavailable');
  });
});
