import { rangeIsReversed, toAuditQuery } from './audit-filter';

describe('toAuditQuery', () => {
  it('leaves out empty filters', () => {
    expect(toAuditQuery({ action: '', actor: '', from: '', to: '' }, 1, 25)).toEqual({ page: 1, pageSize: 25 });
  });

  it('turns local days into the start and end of those days as ISO instants', () => {
    const query = toAuditQuery(
      { action: 'member.removed', actor: '10000000-0000-4000-8000-000000000001', from: '2026-11-02', to: '2026-11-03' },
      2,
      50,
    );
    expect(query.action).toBe('member.removed');
    expect(query.actor).toBe('10000000-0000-4000-8000-000000000001');
    expect(query.page).toBe(2);
    expect(new Date(query.from!).getTime()).toBe(new Date(2026, 10, 2, 0, 0, 0, 0).getTime());
    expect(new Date(query.to!).getTime()).toBe(new Date(2026, 10, 3, 23, 59, 59, 999).getTime());
  });

  it('ignores a date that is not yyyy-mm-dd', () => {
    expect(toAuditQuery({ action: '', actor: '', from: '02/11/2026', to: '' }, 1, 25).from).toBeUndefined();
  });
});

describe('rangeIsReversed', () => {
  it('is true only when both ends are set and the end comes first', () => {
    expect(rangeIsReversed({ from: '2026-11-03', to: '2026-11-02' })).toBe(true);
    expect(rangeIsReversed({ from: '2026-11-02', to: '2026-11-02' })).toBe(false);
    expect(rangeIsReversed({ from: '', to: '2026-11-02' })).toBe(false);
  });
});
