import { parsePartFile, partFileName, partFileText } from './part-file';

describe('part document files', () => {
  const doc = {
    name: 'Junior racket v3',
    primitives: [{ id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, density: 650 }],
    spin: { axis: [1, 0, 0], rate: 31.4 },
  };

  it('reads back what it writes', () => {
    const parsed = parsePartFile(partFileText(doc as never));
    expect(parsed).toEqual({ ok: true, document: doc });
  });

  it('refuses text that is not JSON or not a part document, saying why', () => {
    expect(parsePartFile('{ nope')).toMatchObject({ ok: false, message: expect.stringContaining('not valid JSON') });
    expect(parsePartFile('[1, 2]')).toMatchObject({ ok: false, message: expect.stringContaining('expected a JSON object') });
    expect(parsePartFile('{"primitives": 3, "spin": {}}')).toMatchObject({
      ok: false,
      message: expect.stringContaining('"primitives" must be a list'),
    });
    expect(parsePartFile('{"primitives": []}')).toMatchObject({ ok: false, message: expect.stringContaining('"spin" is missing') });
  });

  it('names the file after the part', () => {
    expect(partFileName(doc as never)).toBe('junior-racket-v3.part.json');
    expect(partFileName({ primitives: [], spin: { axis: [], rate: 1 } })).toBe('part.part.json');
  });
});
