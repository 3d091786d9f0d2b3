import { documentIssues } from './document-issues';
import type { DraftDocument } from './draft-document';
import { applySettings, formValueToSettings, settingsToFormValue, unitDirection } from './part-settings-model';

const DOC: DraftDocument = {
  name: 'Junior racket',
  category: 'racket',
  primitives: [{ id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, density: 650 }],
  spin: { axis: [1, 0, 0], rate: 10 * Math.PI, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

describe('the part settings model', () => {
  it('shows the spin rate in rev/s (1 rev = 2π rad) and the grip point in mm', () => {
    const value = settingsToFormValue(DOC);
    expect(value).toMatchObject({ rate: 5, spinAxis_0: 1, gripOn: true, gripPoint_2: 0, pivot: 152.4, category: 'racket' });
  });

  it('stores a typed rate of 2 rev/s as 4π rad/s', () => {
    const changes = formValueToSettings({ ...settingsToFormValue(DOC), rate: 2 }, DOC);
    expect(changes.spin!.rate).toBeCloseTo(4 * Math.PI, 10);
  });

  it('scales a typed direction to unit length (3-4-5 triangle)', () => {
    expect(unitDirection([3, 4, 0])).toEqual([0.6, 0.8, 0]);
    const changes = formValueToSettings({ ...settingsToFormValue(DOC), spinAxis_0: 0, spinAxis_1: 2, spinAxis_2: 0 }, DOC);
    expect(changes.spin!.axis).toEqual([0, 1, 0]);
  });

  it('keeps a zero or incomplete direction as typed so the schema names it', () => {
    expect(unitDirection([0, 0, 0])).toEqual([0, 0, 0]);
    const doc = applySettings(DOC, formValueToSettings({ ...settingsToFormValue(DOC), spinAxis_0: 0 }, DOC));
    expect(documentIssues(doc)['spin.axis']).toBe('must not be the zero vector');
    expect(unitDirection([1, null, 0])).toEqual([1, null, 0]);
  });

  it('drops the grip frame when it is turned off', () => {
    const doc = applySettings(DOC, formValueToSettings({ ...settingsToFormValue(DOC), gripOn: false }, DOC));
    expect('grip' in doc).toBe(false);
    expect(documentIssues(doc)).toEqual({});
  });

  it('refuses a face normal that is not perpendicular to the long axis', () => {
    const doc = applySettings(DOC, formValueToSettings({ ...settingsToFormValue(DOC), faceNormal_1: 1, faceNormal_2: 1 }, DOC));
    expect(documentIssues(doc)['grip.faceNormal']).toBe('must be perpendicular to grip.axis');
  });
});
