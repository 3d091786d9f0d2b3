import { toOperatorQuery } from './operator-query';

describe('toOperatorQuery', () => {
  it('leaves out empty filters and an unsorted table, so the server uses its default', () => {
    expect(toOperatorQuery({ q: '  ', state: '' }, null)).toEqual({});
    expect(toOperatorQuery({ q: '', state: '' }, { active: 'name', direction: '' })).toEqual({});
  });

  it('sends the trimmed search text and the state', () => {
    expect(toOperatorQuery({ q: '  Gullwing ', state: 'suspended' }, null)).toEqual({ q: 'Gullwing', state: 'suspended' });
  });

  it('maps the table columns to the server’s sort keys with the order', () => {
    expect(toOperatorQuery({ q: '', state: '' }, { active: 'created', direction: 'desc' })).toEqual({ sort: 'createdAt', order: 'desc' });
    expect(toOperatorQuery({ q: '', state: '' }, { active: 'lastActivity', direction: 'asc' })).toEqual({
      sort: 'lastActivityAt',
      order: 'asc',
    });
    expect(toOperatorQuery({ q: '', state: 'past_due' }, { active: 'members', direction: 'asc' })).toEqual({
      state: 'past_due',
      sort: 'members',
      order: 'asc',
    });
  });

  it('never sends a column the server cannot sort by', () => {
    expect(toOperatorQuery({ q: '', state: '' }, { active: 'plan', direction: 'asc' })).toEqual({});
  });

  it('cuts the search text to the 80 characters the server accepts', () => {
    expect(toOperatorQuery({ q: 'x'.repeat(100), state: '' }, null).q).toHaveLength(80);
  });
});
