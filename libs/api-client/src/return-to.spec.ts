import { safeReturnTo } from './return-to';

// Open-redirect cases follow the common practice of accepting only same-origin absolute paths.
describe('safeReturnTo', () => {
  it.each([
    ['/admin/members', '/admin/members'],
    ['/admin/audit?page=2#top', '/admin/audit?page=2#top'],
    ['/invitations/accept?token=abc', '/invitations/accept?token=abc'],
  ])('accepts the same-origin path %s', (input, expected) => {
    expect(safeReturnTo(input)).toBe(expected);
  });

  it.each([
    ['https://elsewhere.example/admin'],
    ['//elsewhere.example/admin'],
    ['/\\elsewhere.example'],
    ['javascript:alert(1)'],
    ['admin/members'],
    ['/admin\n/members'],
    [''],
    [null],
    [undefined],
  ])('refuses %p', (input) => {
    expect(safeReturnTo(input)).toBeNull();
  });
});
