import { isErrorBody } from './error-body';

describe('isErrorBody', () => {
  it('accepts the error body with and without problems', () => {
    expect(isErrorBody({ error: { code: 'invalid_input', message: 'Bad.' } })).toBe(true);
    expect(
      isErrorBody({
        error: {
          code: 'invalid_input',
          message: 'Bad.',
          field: 'file',
          problems: [
            { line: 2, message: 'x' },
            { line: null, message: 'y' },
          ],
        },
      }),
    ).toBe(true);
  });

  it('refuses a body whose problems are not a list of { line, message }', () => {
    expect(isErrorBody({ error: { code: 'c', message: 'm', problems: 'line 2: x' } })).toBe(false);
    expect(isErrorBody({ error: { code: 'c', message: 'm', problems: [{ line: '2', message: 'x' }] } })).toBe(false);
    expect(isErrorBody({ error: { code: 'c', message: 'm', problems: [{ line: 2.5, message: 'x' }] } })).toBe(false);
    expect(isErrorBody({ error: { code: 'c', message: 'm', problems: [{ line: 2 }] } })).toBe(false);
    expect(isErrorBody({ error: { code: 'c', message: 'm', problems: [null] } })).toBe(false);
  });

  it('refuses what is not our error shape', () => {
    expect(isErrorBody(null)).toBe(false);
    expect(isErrorBody('<html>')).toBe(false);
    expect(isErrorBody({ error: { message: 'm' } })).toBe(false);
    expect(isErrorBody({ error: { code: 'c', message: 'm', field: 3 } })).toBe(false);
  });
});
