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

  // An invented practice block: a box 0.3 × 0.2 × 0.1 m has its moments in the ratio 13 : 10 : 5
  // about z, y and x (I ∝ b² + c², Machinery's Handbook box formula).
  const block = (axis: number[], extra: Record<string, unknown> = {}) => ({
    name: 'Practice block',
    primitives: [{ id: 'block', shape: 'box', size: [0.3, 0.2, 0.1], density: 500 }],
    spin: { axis, rate: 2 },
    ...extra,
  });
  async function shown(report: unknown) {
    const fixture = TestBed.createComponent(SpinReportPanel);
    fixture.componentRef.setInput('report', report);
    fixture.componentRef.setInput('rate', 2);
    await fixture.whenStable();
    const host: HTMLElement = fixture.nativeElement;
    return (id: string) => host.querySelector(`[data-testid="${id}"]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? null;
  }

  it('names the axis the motion circles, with its cone, where it is not the nearest axis (44° from the minor axis)', async () => {
    const a = (44 * Math.PI) / 180;
    const report = analyzePart(block([Math.cos(a), 0, Math.sin(a)]));
    expect(report.spin.nearestAxis).toBe('minor');
    expect(report.spin.motionAxis).toBe('major');
    const text = await shown(report);
    expect(text('report-verdict')).toContain('nearest the minor principal axis');
    expect(text('report-motion')).toBe(
      `— the motion circles the major axis (cone half-angle ${formatFigure(report.spin.coneHalfAngleDeg, 3)}°)`,
    );
    expect(text('report-turns')).not.toContain('e-fold'); // no exponential growth away from the intermediate axis
    // Where the motion circles the nearest axis nothing extra is said.
    expect((await shown(analyzePart(block([1, 0, 0]))))('report-motion')).toBeNull();
  });

  it("shows the flight time with its source, marking a category's figure as a common practice estimate", async () => {
    const racket = await shown(analyzePart(RACKET));
    expect(racket('report-flight')).toBe('In the air about 1 s (category default, a common practice estimate).');
    const late = analyzePart(block([0, 1, 0], { category: 'juggling' }));
    expect(late.spin.verdict).toBe('watch');
    expect((await shown(late))('report-flight')).toBe(
      'In the air about 1 s (category default, a common practice estimate): the first flip comes after the flight ends.',
    );
    const own = await shown(analyzePart(block([0, 1, 0], { flightTime: 30 })));
    expect(own('report-flight')).toBe('In the air about 30 s (set for this part).');
  });

  it('still shows a report stored before the motion axis and flight time were computed', async () => {
    const {
      motionAxis: _m,
      coneHalfAngleDeg: _c,
      wobblePeriod: _w,
      flightTime: _f,
      flightTimeSource: _s,
      ...oldSpin
    } = analyzePart(block([0, 0, 1], { category: 'juggling' })).spin;
    const old = { ...analyzePart(block([0, 0, 1])), spin: oldSpin };
    const text = await shown(old);
    expect(text('report-explanation')).toBe(oldSpin.explanation);
    expect(text('report-motion')).toBeNull();
    expect(text('report-flight')).toBeNull();
    expect(text('report-wobble')).toBe(
      `Wobble in the part's own frame: ${formatFigure(oldSpin.wobbleFrequency! / (2 * Math.PI), 3)} Hz, not growing.`,
    );
    // The same report with its period says how often the part wobbles.
    const current = analyzePart(block([0, 0, 1]));
    expect((await shown(current))('report-wobble')).toContain(`once every ${formatFigure(current.spin.wobblePeriod, 3)} s`);
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
