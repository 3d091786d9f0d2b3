import { TestBed } from '@angular/core/testing';
import { analyzePart } from '@tumblewise/engine';
import { unit } from 'mathjs';
import { SpinReportPanel } from './spin-report-panel';
import { formatFigure, inertiaUnitFor, showCheck, showInertia, showLength, turnsBeforeFlip } from './report-figures';

// An invented racket-like part spun about the face-plane axis across the handle: the intermediate
// principal axis (the "tennis racket" case, common practice), so the engine predicts a flip.
const RACKET = {
  name: 'Practice racket',
  category: 'racket',
  primitives: [
    { id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, position: [0, 0, 0.095], density: 650 },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
    { id: 'hoop', shape: 'torus', majorRadius: 0.11, minorRadius: 0.008, position: [0, 0, 0.42], rotationDeg: [90, 0, 0], density: 1500 },
  ],
  spin: { axis: [1, 0, 0], rate: 10 * Math.PI },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

describe('report figures', () => {
  it('counts the turns before a flip as flip time × rate / 2π (one turn is 2π rad)', () => {
    expect(turnsBeforeFlip(0.2, 10 * Math.PI)).toBeCloseTo(1, 12);
    expect(turnsBeforeFlip(null, 10)).toBeNull();
  });

  it('picks kg·cm² from 1 kg·cm² = 1e-4 kg·m² up and g·cm² below', () => {
    expect(inertiaUnitFor([1e-4, 5e-5])).toBe('kg·cm²');
    expect(inertiaUnitFor([9e-5])).toBe('g·cm²');
  });

  it('shows a figure the report leaves out as a dash with no unit after it', () => {
    expect(showLength(null)).toEqual({ value: '—', unit: '' });
    expect(showInertia(null, 'kg·cm²')).toEqual({ value: '—', unit: '' });
    // 1 mm = 0.001 m (SI).
    expect(showLength(0.0125)).toEqual({ value: '12.5', unit: 'mm' });
  });

  it('shows a check limit in display units (mathjs: 0.7366 m = 736.6 mm)', () => {
    const shown = showCheck({
      id: 'x',
      title: 'Overall length',
      rule: 'r',
      value: 0.538,
      unit: 'm',
      limit: { max: 0.7366 },
      status: 'pass',
      indicative: true,
    });
    expect(shown).toEqual({
      value: formatFigure(unit(0.538, 'm').toNumber('mm')),
      limit: `at most ${formatFigure(unit(0.7366, 'm').toNumber('mm'))}`,
      unit: 'mm',
    });
  });
});

describe('SpinReportPanel', () => {
  it('shows the verdict, its explanation, the turn count and the figures in display units', async () => {
    const report = analyzePart(RACKET);
    const fixture = TestBed.createComponent(SpinReportPanel);
    fixture.componentRef.setInput('report', report);
    fixture.componentRef.setInput('rate', RACKET.spin.rate);
    await fixture.whenStable();
    const host: HTMLElement = fixture.nativeElement;
    const text = (id: string) => host.querySelector(`[data-testid="${id}"]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';

    expect(report.spin.verdict).toBe('flip-prone');
    expect(host.querySelector('[data-testid="report-verdict"]')!.getAttribute('data-verdict')).toBe('flip-prone');
    expect(text('report-explanation')).toBe(report.spin.explanation);
    const turns = (report.spin.flipTime! * RACKET.spin.rate) / (2 * Math.PI);
    expect(text('report-turns')).toContain(`At 5 rev/s it makes about ${formatFigure(turns, 2)} turn`);
    expect(text('report-mass')).toBe(`${formatFigure(unit(report.mass, 'kg').toNumber('g'))} g`);
    expect(text('trade-swingweight')).toContain('kg·cm²');
    expect(text('report-checks')).toMatch(/indicative/i);
    expect(text('report-notes')).toContain('estimates');
  });

  it('asks for a grip frame when the trade figures cannot be taken', async () => {
    const { grip: _none, ...withoutGrip } = RACKET;
    const fixture = TestBed.createComponent(SpinReportPanel);
    fixture.componentRef.setInput('report', analyzePart(withoutGrip));
    await fixture.whenStable();
    expect(fixture.nativeElement.querySelector('[data-testid="report-trade-missing"]')).not.toBeNull();
  });

  it('says what to do when there is nothing to report, and shows a failure', async () => {
    const fixture = TestBed.createComponent(SpinReportPanel);
    fixture.componentRef.setInput('error', 'The server could not be reached.');
    await fixture.whenStable();
    const host: HTMLElement = fixture.nativeElement;
    expect(host.querySelector('[data-testid="report-empty"]')!.textContent).toContain('Add a primitive');
    expect(host.querySelector('[data-testid="report-error"]')!.textContent).toContain('could not be reached');
  });
});
