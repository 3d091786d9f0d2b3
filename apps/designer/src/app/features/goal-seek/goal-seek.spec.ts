import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { analyzePart, solveDesignRequest } from '@tumblewise/engine';
import type { Part, Project, Role, SolveAnswer, SolveRequest, Variant } from '@tumblewise/shared';
import { Confirmation, type ConfirmRequest } from '@tumblewise/ui';
import { of } from 'rxjs';
import { GoalSeekPage } from './goal-seek';

// Invented workspace, project and part: a juggling baton of a capsule rod and two knobs, with a grip frame along z.
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const PROJECT: Project = {
  id: PROJECT_ID,
  name: 'Practice batons',
  category: 'juggling',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const ROD = { r: 0.009, L: 0.5, rho: 1200 };
const KNOB = { r: 0.03, rho: 300 };
const DRAFT = {
  name: 'Practice baton',
  primitives: [
    { id: 'rod', shape: 'capsule', radius: ROD.r, length: ROD.L, position: [0, 0, 0.3], density: ROD.rho },
    { id: 'knob-low', shape: 'sphere', radius: KNOB.r, position: [0, 0, 0.03], density: KNOB.rho },
    { id: 'knob-high', shape: 'sphere', radius: KNOB.r, position: [0, 0, 0.57], density: KNOB.rho },
  ],
  spin: { axis: [1, 0, 0], rate: 12.6, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};
const { grip: _noGrip, ...DRAFT_NO_GRIP } = DRAFT;
const part = (draft: unknown, draftVersion = 7): Part => ({
  id: PART_ID,
  projectId: PROJECT_ID,
  name: 'Practice baton',
  draft,
  draftVersion,
  latestVariant: null,
  variantCount: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: '2026-12-01T10:30:00.000Z',
});
const V1: Variant = {
  id: '60000000-0000-4000-8000-000000000001',
  partId: PART_ID,
  number: 1,
  label: 'foam knobs',
  notes: '',
  document: DRAFT,
  report: {},
  engineVersion: 'test',
  status: 'draft',
  author: null,
  version: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};

// Volumes by the handbook formulas (Machinery's Handbook): sphere 4/3·πr³; a capsule is a cylinder πr²L plus one sphere.
const sphereVolume = (r: number) => (4 / 3) * Math.PI * r ** 3;
const rodVolume = Math.PI * ROD.r ** 2 * ROD.L + sphereVolume(ROD.r);
const knobsMass = 2 * KNOB.rho * sphereVolume(KNOB.r);

/** Runs effects and lets pending microtasks and timers settle; unlike whenStable it does not wait for open requests. */
async function settle(): Promise<void> {
  TestBed.tick();
  await new Promise((r) => setTimeout(r, 0));
  TestBed.tick();
}

describe('GoalSeekPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let asked: ConfirmRequest[];
  let answer: boolean;

  async function open(options: { role?: Role; draft?: unknown; partFails?: boolean } = {}): Promise<void> {
    const draft = 'draft' in options ? options.draft : DRAFT;
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'projects/:projectId/parts/:partId/goal-seek', component: GoalSeekPage }], withComponentInputBinding()),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: Confirmation, useValue: { ask: (r: ConfirmRequest) => (asked.push(r), of(answer)) } },
      ],
    });
    asked = [];
    answer = true;
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [{ workspace: WORKSPACE, role: options.role ?? 'designer' }],
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: WORKSPACE.createdAt,
      },
    });
    backend = TestBed.inject(HttpTestingController);
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/goal-seek`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    if (options.partFails)
      backend
        .expectOne(`${BASE}/parts/${PART_ID}`)
        .flush({ error: { code: 'unavailable', message: 'The database is not answering.' } }, { status: 503, statusText: 'Unavailable' });
    else backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(draft));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1]);
    await settle();
    host = harness.routeNativeElement!;
  }

  /** Answers the analysis of the draft (the figures now) with the engine's own report. */
  async function flushAnalysis(draft: unknown = DRAFT): Promise<void> {
    const call = backend.expectOne((r) => r.url === '/api/v1/analyze');
    expect(call.request.params.get('workspace')).toBe(WORKSPACE.id);
    expect(call.request.body).toEqual(draft);
    call.flush(analyzePart(draft));
    await settle();
  }

  afterEach(() => backend.verify());

  const testId = (id: string, within: ParentNode = host) => within.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const all = (id: string) => Array.from(host.querySelectorAll<HTMLElement>(`[data-testid="${id}"]`));
  const text = (el: Element | null) => (el?.textContent ?? '').replace(/\s+/g, ' ').trim();
  const input = (id: string) => testId(id) as HTMLInputElement;
  const type = async (id: string, value: string) => {
    input(id).value = value;
    input(id).dispatchEvent(new Event('input'));
    input(id).dispatchEvent(new Event('blur'));
    await settle();
  };
  const choose = async (id: string, value: string) => {
    const select = testId(id) as HTMLSelectElement;
    select.value = value;
    select.dispatchEvent(new Event('change'));
    await settle();
  };
  const click = async (id: string) => {
    testId(id)!.click();
    await settle();
  };
  /** The pending solve call, checked for its address and workspace. */
  const solveCall = (): TestRequest => {
    const call = backend.expectOne((r) => r.url === '/api/v1/solve');
    expect(call.request.method).toBe('POST');
    expect(call.request.params.get('workspace')).toBe(WORKSPACE.id);
    return call;
  };
  /** Answers a solve as the server would: the engine's goal seek on the body as sent. */
  const answerWithEngine = async (call: TestRequest): Promise<SolveAnswer> => {
    const result = solveDesignRequest(call.request.body) as unknown as SolveAnswer;
    const body = JSON.parse(JSON.stringify(result)) as SolveAnswer;
    call.flush(body);
    await settle();
    return body;
  };
  /** Frees the rod's density and aims at a mass of 250 g; returns the solve call. */
  const askForMass = async (): Promise<TestRequest> => {
    await click('free-toggle-rod-density');
    await type('target-value-0', '250');
    await click('solve');
    return solveCall();
  };

  it('says where it is and which draft it works on, and lists the draft’s fields with the editor’s labels and units', async () => {
    await open();
    await flushAnalysis();
    expect(
      Array.from(host.querySelectorAll('nav[aria-label="Breadcrumb"] a, nav[aria-label="Breadcrumb"] [aria-current]')).map(text),
    ).toEqual(['Projects', 'Practice batons', 'Practice baton', 'Goal seek']);
    expect(text(testId('goal-seek-source'))).toContain('draft version 7');
    // What the toggle says (its icon is hidden from assistive technology).
    const said = (id: string) => text(testId(id)).replace(/^lock ?/, '');
    expect(testId('free-toggle-rod-density')!.querySelector('.material-icons')!.getAttribute('aria-hidden')).toBe('true');
    expect(said('free-toggle-rod-density')).toBe('Density 1200 kg/m³');
    expect(said('free-toggle-rod-radius')).toBe('Radius 9 mm');
    expect(said('free-toggle-rod-length')).toBe('Straight length 500 mm');
    expect(said('free-toggle-knob-high-position.2')).toBe('Position z 570 mm');
    // One target to start with: the mass, with the draft's mass now beside it.
    expect(all('target-row-0')).toHaveLength(1);
    expect((testId('target-figure-0') as HTMLSelectElement).value).toBe('mass');
    const massNow = (ROD.rho * rodVolume + knobsMass) * 1000;
    expect(text(testId('target-now-0'))).toBe(`now ${Number(massNow.toPrecision(4))} g`);
  });

  it('marks a field free with a keyboard-operable toggle, default bounds of ±20 % in display units, and sends them in SI', async () => {
    await open();
    await flushAnalysis();
    const toggle = testId('free-toggle-rod-density')!;
    expect(toggle.tagName).toBe('BUTTON');
    expect(toggle.getAttribute('aria-pressed')).toBe('false');
    await click('free-toggle-rod-density');
    expect(testId('free-toggle-rod-density')!.getAttribute('aria-pressed')).toBe('true');
    expect(input('free-min-rod-density').value).toBe('960');
    expect(input('free-max-rod-density').value).toBe('1440');
    await click('free-toggle-knob-high-position.2');
    expect(input('free-min-knob-high-position.2').value).toBe('456');
    await type('free-min-knob-high-position.2', '550');
    await type('free-max-knob-high-position.2', '590');
    await type('target-value-0', '250');
    await click('solve');
    const call = solveCall();
    const body = call.request.body as SolveRequest;
    // The draft as stored; bounds in SI (1 mm = 1e-3 m, NIST SP 811); the target in kg.
    expect(body.part).toEqual(DRAFT);
    expect(body.free).toEqual([
      { primitive: 'rod', parameter: 'density', min: 960, max: 1440 },
      { primitive: 'knob-high', parameter: 'position.2', min: 0.55, max: 0.59 },
    ]);
    expect(body.targets).toEqual([{ figure: 'mass', value: 0.25 }]);
    call.flush({ status: 'met', part: DRAFT, report: {}, achieved: [], changes: [] });
    await settle();
    // A second click fixes the field again.
    await click('free-toggle-rod-density');
    expect(testId('free-min-rod-density')).toBeNull();
  });

  it('shows the met proposal as a diff with the achieved figures; the rod density is what the capsule volume gives', async () => {
    await open();
    await flushAnalysis();
    await answerWithEngine(await askForMass());
    const status = testId('solve-status')!;
    expect(status.getAttribute('data-status')).toBe('met');
    expect(text(status)).toContain('Every target met');
    // m = ρ_rod·V_rod + knobs, V_rod = πr²L + 4/3·πr³ (capsule = cylinder + sphere, handbook volumes).
    const rho = (0.25 - knobsMass) / rodVolume;
    const rows = all('diff-row');
    expect(rows).toHaveLength(1);
    const cells = Array.from(rows[0].querySelectorAll('th, td')).map(text);
    expect(cells.slice(0, 2)).toEqual(['rod', 'Density']);
    const [from, to] = cells[2].split(' → ');
    expect(from).toBe('1200 kg/m³');
    expect(Number(to.replace(' kg/m³', ''))).toBeCloseTo(rho, -1);
    expect(cells[3]).toMatch(/^[+−]\d/);
    const achieved = all('achieved-row');
    expect(achieved.map((r) => Array.from(r.querySelectorAll('th, td')).map(text))).toEqual([
      ['Mass', '= 250 g', expect.stringMatching(/^(249\.[89]|250(\.[0-2])?) g$/), '✓ met'],
    ]);
    const caption = testId('solve-diff')!.querySelector('caption');
    expect(text(caption)).toBe('Proposed changes');
    expect(Array.from(testId('solve-diff')!.querySelectorAll('thead th[scope="col"]')).map(text)).toEqual([
      'Primitive',
      'Field',
      'Draft → proposed',
      'Change',
    ]);
  });

  it('adds, changes and removes targets; grip figures come in the display units of the trade', async () => {
    await open();
    await flushAnalysis();
    await click('target-add');
    expect((testId('target-figure-1') as HTMLSelectElement).value).toBe('balancePoint');
    await choose('target-figure-1', 'swingweight');
    await choose('target-kind-1', 'atMost');
    await type('target-value-1', '320');
    await click('target-add');
    await choose('target-figure-2', 'steadyMargin');
    await choose('target-kind-2', 'atLeast');
    await type('target-value-2', '5');
    await click('target-add');
    await click('target-remove-3');
    expect(testId('target-row-3')).toBeNull();
    await click('free-toggle-rod-radius');
    await type('target-value-0', '240');
    await click('solve');
    const call = solveCall();
    // 1 kg·cm² = 1e-4 kg·m²; 5 % = 0.05.
    expect((call.request.body as SolveRequest).targets).toEqual([
      { figure: 'mass', value: 0.24 },
      { figure: 'swingweight', max: 0.032 },
      { figure: 'steadyMargin', min: 0.05 },
    ]);
    call.flush({ status: 'met', part: DRAFT, report: {}, achieved: [], changes: [] });
    await settle();
  });

  it('refuses empty bounds and targets in the form and sends nothing', async () => {
    await open();
    await flushAnalysis();
    await click('solve');
    expect(text(testId('error-banner'))).toContain('Mark at least one field free');
    await click('free-toggle-rod-radius');
    await type('free-max-rod-radius', '5');
    await type('target-value-0', '');
    await click('solve');
    backend.expectNone((r) => r.url === '/api/v1/solve');
    expect(text(host)).toContain('Radius to must be greater than the lower bound.');
    expect(text(testId('target-error-0'))).toBe('Mass target is required.');
  });

  it('puts a 400 beside the row it names: a bound of a free parameter, a target’s value', async () => {
    await open();
    await flushAnalysis();
    (await askForMass()).flush(
      { error: { code: 'invalid', message: 'free[0].max density must be at most 100000 kg/m³', field: 'free[0].max' } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(text(host)).toContain('Density to density must be at most 100000 kg/m³.');
    // The field stays marked until it is changed; then the next solve goes out.
    await click('solve');
    backend.expectNone((r) => r.url === '/api/v1/solve');
    await type('free-max-rod-density', '1400');
    await click('solve');
    solveCall().flush(
      { error: { code: 'invalid', message: 'targets[0].value must be a number', field: 'targets[0].value' } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(text(testId('target-error-0'))).toBe('Mass target must be a number.');
    expect(text(testId('error-banner'))).toContain('see the message beside it');
    // A problem of the draft itself names its path and sends the designer to the editor.
    await type('target-value-0', '251');
    await click('solve');
    solveCall().flush(
      { error: { code: 'invalid', message: 'part.primitives[0].radius must be greater than zero', field: 'part.primitives[0].radius' } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(text(testId('error-banner'))).toContain('The draft has a problem at primitives[0].radius');
  });

  it('says why the answer is only the closest, and offers nothing to save when no valid part exists', async () => {
    await open();
    await flushAnalysis();
    await click('free-toggle-rod-density');
    await type('free-max-rod-density', '1250');
    await type('target-value-0', '300');
    await click('solve');
    const closest = await answerWithEngine(solveCall());
    expect(closest.status).toBe('closest');
    expect(testId('solve-status')!.getAttribute('data-status')).toBe('closest');
    expect(text(testId('solve-reason'))).toBe(closest.reason);
    expect(all('achieved-row')[0].getAttribute('data-met')).toBe('false');
    expect(text(all('achieved-row')[0])).toContain('✗ not met');
    expect(testId('save-proposal')).not.toBeNull();

    await click('solve');
    solveCall().flush({
      status: 'infeasible',
      part: DRAFT,
      report: {},
      achieved: [{ figure: 'mass', value: 0.2, target: { value: 0.3 }, met: false }],
      changes: [],
      reason: 'No values within the bounds give a valid part: rod: innerRadius must be less than radius. The part is unchanged.',
    });
    await settle();
    expect(testId('solve-status')!.getAttribute('data-status')).toBe('infeasible');
    expect(text(testId('solve-status'))).toContain('No valid part within the bounds');
    expect(testId('solve-no-changes')).not.toBeNull();
    expect(testId('save-proposal')).toBeNull();
    expect(testId('apply-proposal')).toBeNull();
  });

  it('cancels a solve under way', async () => {
    await open();
    await flushAnalysis();
    const call = await askForMass();
    expect(testId('solving')).not.toBeNull();
    await click('solve-cancel');
    expect(call.cancelled).toBe(true);
    expect(testId('solving')).toBeNull();
    expect(text(testId('goal-seek-notice'))).toBe('Solve cancelled. Nothing changed.');
  });

  it('saves the proposal as a new variant in one click and links to it', async () => {
    await open();
    await flushAnalysis();
    const solved = await answerWithEngine(await askForMass());
    await click('save-proposal');
    const save = backend.expectOne(`${BASE}/parts/${PART_ID}/variants`);
    expect(save.request.method).toBe('POST');
    const body = save.request.body as { document: unknown; label: string; notes: string };
    expect(body.document).toEqual(solved.part);
    expect(body.label).toBe('Goal seek: mass 250 g');
    expect(body.notes).toMatch(/^Proposed by goal seek from draft version 7, every target met\. Changes: rod density 1200 kg\/m³ → /);
    save.flush({ ...V1, id: '60000000-0000-4000-8000-000000000002', number: 2, label: body.label, document: solved.part });
    await settle();
    expect(text(testId('saved-notice'))).toContain('Saved as variant v2 Goal seek: mass 250 g.');
    expect(testId('saved-variant-link')!.getAttribute('href')).toBe(
      `/projects/${PROJECT_ID}/parts/${PART_ID}?variant=60000000-0000-4000-8000-000000000002`,
    );
    expect((testId('save-proposal') as HTMLButtonElement).disabled).toBe(true);
  });

  it('asks before applying the proposal to the draft, sends the draft version, and says so on a conflict', async () => {
    await open();
    await flushAnalysis();
    const solved = await answerWithEngine(await askForMass());
    answer = false;
    await click('apply-proposal');
    expect(asked).toHaveLength(1);
    expect(asked[0]).toMatchObject({ title: 'Replace the draft with this proposal?', confirmLabel: 'Replace the draft' });
    expect(asked[0].message).toContain('version 7');
    backend.expectNone(`${BASE}/parts/${PART_ID}`);

    answer = true;
    await click('apply-proposal');
    const conflict = backend.expectOne(`${BASE}/parts/${PART_ID}`);
    expect(conflict.request.method).toBe('PATCH');
    expect(conflict.request.body).toEqual({ draft: solved.part, draftVersion: 7 });
    conflict.flush(
      { error: { code: 'stale_version', message: 'The part was changed by someone else.' } },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    expect(text(testId('error-banner'))).toContain('Nothing was replaced');
    expect(testId('reload-draft')).not.toBeNull();

    await click('apply-proposal');
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(solved.part, 8));
    await settle();
    await flushAnalysis(solved.part);
    expect(text(testId('applied-notice'))).toContain('draft version 8');
    expect(text(testId('goal-seek-source'))).toContain('draft version 8');
  });

  it('builds the lead-tape request: a point mass on the grip axis, its mass and place free within the zone, two targets', async () => {
    await open();
    await flushAnalysis();
    (testId('mode-lead-tape')!.querySelector('input') as HTMLInputElement).click();
    await settle();
    expect(testId('free-picker')).toBeNull();
    await type('tape-max', '12');
    await type('tape-from', '450');
    await type('tape-to', '560');
    await type('tape-swingweight', '95');
    await type('tape-balance', '310');
    await click('solve');
    const call = solveCall();
    const body = call.request.body as SolveRequest;
    expect(body.part.primitives).toHaveLength(4);
    expect(body.part.primitives.slice(0, 3)).toEqual(DRAFT.primitives);
    expect(body.part.primitives[3]).toEqual({ id: 'lead-tape', shape: 'point', mass: 0.00605, position: [0, 0, 0.505] });
    expect(body.free).toEqual([
      { primitive: 'lead-tape', parameter: 'mass', min: 0.0001, max: 0.012 },
      { primitive: 'lead-tape', parameter: 'position.2', min: 0.45, max: 0.56 },
    ]);
    expect(body.targets).toEqual([
      { figure: 'swingweight', value: 0.0095 },
      { figure: 'balancePoint', value: 0.31 },
    ]);
    const solved = await answerWithEngine(call);
    expect(text(testId('solve-tape'))).toMatch(/^Put [\d.]+ g of tape [\d.]+ mm from the butt/);
    expect(Array.from(all('diff-row')[0].querySelectorAll('td')).map(text)[1]).toMatch(/^new → [\d.]+ g$/);
    await click('save-proposal');
    const save = backend.expectOne(`${BASE}/parts/${PART_ID}/variants`);
    expect((save.request.body as { label: string }).label).toBe('Lead tape: swingweight 95 kg·cm², balance point 310 mm');
    expect((save.request.body as { document: unknown }).document).toEqual(solved.part);
    save.flush({ ...V1, number: 2 });
    await settle();
  });

  it('without a grip frame: grip figures are disabled with a note, and the lead-tape preset says why it is off', async () => {
    await open({ draft: DRAFT_NO_GRIP });
    await flushAnalysis(DRAFT_NO_GRIP);
    expect(testId('targets-no-grip')).not.toBeNull();
    const options = Array.from((testId('target-figure-0') as HTMLSelectElement).options);
    expect(options.filter((o) => o.disabled).map((o) => o.value)).toEqual([
      'balancePoint',
      'swingweight',
      'twistweight',
      'pivotMoment',
      'centreOfPercussion',
    ]);
    expect(options.find((o) => o.value === 'swingweight')!.textContent).toContain('needs a grip frame');
    (testId('mode-lead-tape')!.querySelector('input') as HTMLInputElement).click();
    await settle();
    expect(text(testId('lead-tape-unavailable'))).toContain('no grip frame');
    expect((testId('solve') as HTMLButtonElement).disabled).toBe(true);
  });

  it('shows an empty state without a draft, and the problems of an invalid one', async () => {
    await open({ draft: null });
    expect(text(testId('goal-seek-empty'))).toContain('No draft to solve on yet');
    backend.expectNone((r) => r.url === '/api/v1/analyze');
  });

  it('lists what is wrong with an invalid draft and sends the designer to the editor', async () => {
    await open({ draft: { ...DRAFT, primitives: [{ ...DRAFT.primitives[0], radius: -1 }] } });
    expect(text(testId('goal-seek-invalid'))).toContain('primitives[0].radius must be greater than zero');
    backend.expectNone((r) => r.url === '/api/v1/analyze');
  });

  it('shows the load failure with a retry that loads again', async () => {
    await open({ partFails: true });
    expect(text(testId('error-banner'))).toContain('The database is not answering.');
    Array.from(host.querySelectorAll('button'))
      .find((b) => text(b) === 'Try again')!
      .click();
    await settle();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(DRAFT));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1]);
    await settle();
    await flushAnalysis();
    expect(testId('error-banner')).toBeNull();
    expect(testId('free-picker')).not.toBeNull();
  });

  it('lets a reviewer solve but not save', async () => {
    await open({ role: 'reviewer' });
    await flushAnalysis();
    await answerWithEngine(await askForMass());
    expect(testId('save-proposal')).toBeNull();
    expect(testId('proposal-read-only')).not.toBeNull();
  });
});
