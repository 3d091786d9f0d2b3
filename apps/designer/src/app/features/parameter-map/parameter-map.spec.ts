import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { sweepDesign } from '@tumblewise/engine';
import { partDocumentSchema, type Part, type Project, type Role, type SweepAnswer, type SweepRequest } from '@tumblewise/shared';
import { ParameterMapPage } from './parameter-map';

// Invented workspace, project and parts (the Kestrel Bay scenario's kind of data, not any real product).
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const SWEEP = `/api/v1/sweep?workspace=${WORKSPACE.id}`;
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const PROJECT: Project = {
  id: PROJECT_ID,
  name: 'Practice paddles',
  category: 'juggling',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
/** A flat blade 100 × 60 × 20 mm spun about x, and a foam sleeve with a bore. */
const DRAFT = {
  name: 'Practice paddle',
  primitives: [
    { id: 'blade', shape: 'box', size: [0.1, 0.06, 0.02], position: [0, 0, 0], rotationDeg: [0, 0, 0], density: 700, mode: 'add' },
    {
      id: 'sleeve',
      shape: 'cylinder',
      radius: 0.015,
      innerRadius: 0.009,
      length: 0.2,
      position: [0, 0, 0.15],
      rotationDeg: [0, 0, 0],
      density: 100,
      mode: 'add',
    },
  ],
  spin: { axis: [1, 0, 0], rate: 12, misalignmentDeg: 1 },
};
/** The blade alone. */
const BLADE_ONLY = { ...DRAFT, primitives: DRAFT.primitives.slice(0, 1) };
const part = (draft: unknown, draftVersion = 3): Part =>
  ({
    id: PART_ID,
    projectId: PROJECT_ID,
    name: 'Practice paddle',
    draft,
    draftVersion,
    latestVariant: null,
    variantCount: 0,
    createdAt: WORKSPACE.createdAt,
    updatedAt: WORKSPACE.createdAt,
  }) as Part;
const FIGURES = ['steadyMargin', 'mass', 'I1', 'I2', 'I3'];

/** A 3 × 2 map of blade size x against the sleeve's bore; the widest bore leaves no valid part. */
const MAP_ANSWER: SweepAnswer = {
  axes: [
    { primitive: 'blade', parameter: 'size.0', values: [0.07, 0.1, 0.13] },
    { primitive: 'sleeve', parameter: 'innerRadius', values: [0.009, 0.016] },
  ],
  figures: ['steadyMargin', 'mass'],
  points: [
    { values: [0.07, 0.009], verdict: 'flip-prone', nearestAxis: 'intermediate', figures: { steadyMargin: -0.2, mass: 0.07 } },
    {
      values: [0.07, 0.016],
      verdict: null,
      nearestAxis: null,
      figures: { steadyMargin: null, mass: null },
      error: 'sleeve: innerRadius must be less than radius',
    },
    { values: [0.1, 0.009], verdict: 'steady', nearestAxis: 'minor', figures: { steadyMargin: 0.3, mass: 0.09 } },
    {
      values: [0.1, 0.016],
      verdict: null,
      nearestAxis: null,
      figures: { steadyMargin: null, mass: null },
      error: 'sleeve: innerRadius must be less than radius',
    },
    { values: [0.13, 0.009], verdict: 'steady', nearestAxis: 'minor', figures: { steadyMargin: 0.5, mass: 0.11 } },
    {
      values: [0.13, 0.016],
      verdict: null,
      nearestAxis: null,
      figures: { steadyMargin: null, mass: null },
      error: 'sleeve: innerRadius must be less than radius',
    },
  ],
};

/** A three-step line of the blade's size x. */
const LINE_ANSWER: SweepAnswer = {
  axes: [MAP_ANSWER.axes[0]],
  figures: ['steadyMargin', 'mass'],
  points: [MAP_ANSWER.points[0], MAP_ANSWER.points[2], MAP_ANSWER.points[4]].map((p, k) => ({
    ...p,
    values: [MAP_ANSWER.axes[0].values[k]],
  })),
};

describe('ParameterMapPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeAll(() => (HTMLCanvasElement.prototype.getContext = (() => null) as never));

  async function open(options: { role?: Role; draft?: unknown; partFails?: boolean } = {}): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter(
          [
            { path: 'projects/:projectId/parts/:partId/parameter-map', component: ParameterMapPage },
            { path: 'projects/:projectId/parts/:partId', children: [] },
          ],
          withComponentInputBinding(),
        ),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
      ],
    });
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
    (globalThis as { ResizeObserver?: unknown }).ResizeObserver = class {
      observe() {}
      unobserve() {}
      disconnect() {}
    };
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/parameter-map`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    if (options.partFails) {
      backend
        .expectOne(`${BASE}/parts/${PART_ID}`)
        .flush({ error: { code: 'internal', message: 'Try again.' } }, { status: 503, statusText: 'Unavailable' });
    } else {
      backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(options.draft === undefined ? DRAFT : options.draft));
    }
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([]);
    await settle();
    host = harness.routeNativeElement!;
  }

  afterEach(() => {
    backend.verify();
    document.querySelectorAll('.cdk-overlay-container').forEach((e) => (e.innerHTML = ''));
    delete (globalThis as { ResizeObserver?: unknown }).ResizeObserver;
  });

  const settle = async () => {
    await harness.fixture.whenStable();
    harness.fixture.detectChanges();
  };
  const testId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const inPage = (id: string) => document.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const type = async (id: string, value: string) => {
    const input = testId(id) as HTMLInputElement;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await settle();
  };
  const chooseField = async (axis: number, primitive: string, parameter: string) => {
    testId(`map-parameter-${axis}`)!.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await settle();
    inPage(`map-option-${primitive}-${parameter}`)!.click();
    await settle();
  };
  const legendCount = (cls: string) => Number(testId(`legend-${cls}`)!.getAttribute('data-count'));
  const sweepRequest = (): TestRequest => {
    const req = backend.expectOne(SWEEP);
    expect(req.request.method).toBe('POST');
    return req;
  };
  /** Builds the 3 × 2 map of blade size x against the sleeve's bore and flushes MAP_ANSWER. */
  const buildMap = async () => {
    testId('map-two')!.querySelector('button')!.click();
    await settle();
    await chooseField(1, 'sleeve', 'innerRadius');
    await type('map-steps-0', '3');
    await type('map-to-1', '16');
    await type('map-steps-1', '2');
    testId('map-run')!.click();
    await settle();
    const req = sweepRequest();
    expect((req.request.body as SweepRequest).axes).toEqual([
      { primitive: 'blade', parameter: 'size.0', from: 0.07, to: 0.13, steps: 3 },
      { primitive: 'sleeve', parameter: 'innerRadius', from: 0.0063, to: 0.016, steps: 2 },
    ]);
    req.flush(MAP_ANSWER);
    await settle();
  };

  it('sits under its part in the breadcrumbs and offers the draft’s fields with the editor’s labels', async () => {
    await open();
    expect(
      Array.from(host.querySelectorAll('nav[aria-label="Breadcrumb"] a, nav[aria-label="Breadcrumb"] [aria-current]')).map((e) =>
        e.textContent!.trim(),
      ),
    ).toEqual(['Projects', 'Practice paddles', 'Practice paddle', 'Parameter map']);
    testId('map-parameter-0')!.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await settle();
    const options = Array.from(document.querySelectorAll('mat-option')).map((o) => o.textContent!.trim());
    expect(options.slice(0, 4)).toEqual(['Size x (mm)', 'Size y (mm)', 'Size z (mm)', 'Density (kg/m³)']);
    expect(options).toContain('Inner radius (mm)');
    expect(Array.from(document.querySelectorAll('.mat-mdc-optgroup-label')).map((g) => g.textContent!.trim())).toEqual([
      'blade (Box)',
      'sleeve (Cylinder)',
    ]);
  });

  it('sends one field in SI from the ±30 % default, and shades the line by verdict: flip-prone exactly while the blade is narrower than wide', async () => {
    await open({ draft: BLADE_ONLY });
    // Default: the blade's size x, 100 mm ± 30 %, 41 steps.
    expect((testId('map-from-0') as HTMLInputElement).value).toBe('70');
    expect((testId('map-to-0') as HTMLInputElement).value).toBe('130');
    expect((testId('map-steps-0') as HTMLInputElement).value).toBe('41');
    expect(testId('map-total')!.textContent).toContain('41 grid points');
    await type('map-from-0', '30');
    await type('map-to-0', '90');
    testId('map-run')!.click();
    await settle();
    expect(testId('map-sweeping')!.textContent).toContain('41 grid points');
    const req = sweepRequest();
    const body = req.request.body as SweepRequest;
    // mm → m by the SI prefix milli = 10⁻³ (BIPM SI Brochure, 9th ed.).
    expect(body.axes).toEqual([{ primitive: 'blade', parameter: 'size.0', from: 0.03, to: 0.09, steps: 41 }]);
    expect(body.figures).toEqual(FIGURES);
    expect(body.part).toEqual(BLADE_ONLY);
    // The engine answers as the server would.
    const answer = sweepDesign(partDocumentSchema.parse(body.part), { axes: body.axes as never, figures: body.figures as never });
    req.flush(answer);
    await settle();
    expect(testId('map-sweeping')).toBeNull();
    expect(testId('map-chart')!.getAttribute('data-points')).toBe('41');
    // A cuboid's moments: I_x ∝ b² + c², I_y ∝ a² + c², I_z ∝ a² + b² (common practice; any statics handbook's
    // table of solids). With b = 60 mm, c = 20 mm and spin about x: for a < b the x axis is the intermediate one
    // (flip-prone, the intermediate-axis theorem, common practice); for a > b it is the minor one (not flip-prone).
    const narrower = answer.axes[0].values.filter((a) => a < 0.0595).length;
    expect(legendCount('flip-prone')).toBe(narrower);
    expect(answer.points.filter((p, k) => answer.axes[0].values[k] > 0.0605 && p.verdict === 'flip-prone')).toEqual([]);
    expect(testId('map-summary')!.textContent).toMatch(/^Of 41 grid points: Steady \d+ %, Watch \d+(\.\d)? %, Flip-prone \d+ %/);
  });

  it('refuses more than 10 000 points with a clear message and sends nothing', async () => {
    await open();
    testId('map-two')!.querySelector('button')!.click();
    await settle();
    expect((testId('map-steps-0') as HTMLInputElement).value).toBe('31');
    expect(testId('map-total')!.textContent).toContain('961 grid points');
    await type('map-steps-0', '101');
    await type('map-steps-1', '100');
    expect(testId('map-limit')!.textContent).toBe(
      '101 × 100 = 10 100 grid points is more than one map may hold (10 000). Use fewer steps.',
    );
    testId('map-run')!.click();
    await settle();
    backend.expectNone(SWEEP);
  });

  it('maps two fields by verdict, the invalid points as their own class, and picks a point by typed values', async () => {
    await open();
    await buildMap();
    expect([legendCount('steady'), legendCount('watch'), legendCount('flip-prone'), legendCount('invalid')]).toEqual([2, 0, 1, 3]);
    expect(testId('map-summary')!.textContent).toBe('Of 6 grid points: Steady 33 %, Watch 0 %, Flip-prone 17 %, No valid part 50 %.');
    // Keyboard: the nearest grid point to 104 mm and 10 mm is (100 mm, 9 mm), index 2 in row-major order.
    await type('finder-value-0', '104');
    await type('finder-value-1', '10');
    testId('finder-go')!.click();
    await settle();
    expect(testId('point-value-0')!.textContent).toBe('100 mm');
    expect(testId('point-value-1')!.textContent).toBe('9 mm');
    expect(testId('point-verdict')!.querySelector('[data-verdict]')!.getAttribute('data-verdict')).toBe('steady');
    expect(testId('point-figures')!.textContent).toContain('30 %');
    // A point without a valid part says why and cannot be loaded.
    await type('finder-value-1', '16');
    testId('finder-go')!.click();
    await settle();
    expect(testId('point-error')!.textContent).toContain('innerRadius must be less than radius');
    expect((testId('point-load') as HTMLButtonElement).disabled).toBe(true);
  });

  it('asks before loading a point into the draft, then writes its values in SI and saves with the draft version', async () => {
    await open();
    await buildMap();
    await type('finder-value-0', '130');
    await type('finder-value-1', '9');
    testId('finder-go')!.click();
    await settle();
    testId('point-load')!.click();
    await settle();
    expect(document.querySelector('mat-dialog-container')!.textContent).toContain('blade · Size x: 100 mm → 130 mm');
    inPage('confirm-cancel')!.click();
    await settle();
    backend.expectNone(`${BASE}/parts/${PART_ID}`);

    testId('point-load')!.click();
    await settle();
    inPage('confirm-accept')!.click();
    await settle();
    const save = backend.expectOne(`${BASE}/parts/${PART_ID}`);
    expect(save.request.method).toBe('PATCH');
    const { draft, draftVersion } = save.request.body as { draft: typeof DRAFT; draftVersion: number };
    expect(draftVersion).toBe(3);
    expect(draft.primitives[0].size).toEqual([0.13, 0.06, 0.02]);
    expect(draft.primitives[1]).toEqual(DRAFT.primitives[1]);
    expect(draft.spin).toEqual(DRAFT.spin);
    save.flush(part(draft, 4));
    await settle();
    expect(testId('map-loaded')!.textContent).toContain('blade · Size x: 100 mm → 130 mm');
    expect(testId('map-open-editor')!.getAttribute('href')).toBe(`/projects/${PROJECT_ID}/parts/${PART_ID}`);
    // The field's hint now reads the draft's new value.
    expect(testId('map-axis-0')!.textContent).toContain('now 130 mm');
  });

  it('names a conflict when someone saved the draft meanwhile, and reloads it on request', async () => {
    await open();
    await buildMap();
    await type('finder-value-0', '70');
    await type('finder-value-1', '9');
    testId('finder-go')!.click();
    await settle();
    testId('point-load')!.click();
    await settle();
    inPage('confirm-accept')!.click();
    await settle();
    backend
      .expectOne(`${BASE}/parts/${PART_ID}`)
      .flush(
        { error: { code: 'stale_version', message: 'The part changed since you loaded it.' } },
        { status: 409, statusText: 'Conflict' },
      );
    await settle();
    expect(testId('map-conflict')!.textContent).toContain('Someone saved this part’s draft after the map loaded it');
    expect(testId('map-loaded')).toBeNull();
    testId('map-conflict-reload')!.click();
    TestBed.tick(); // the loads are pending tasks: answer them before waiting for the page to settle
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(DRAFT, 5));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([]);
    await settle();
    expect(testId('map-conflict')).toBeNull();
  });

  it('names the field of a refused sweep: a draft problem as a sentence, an axis setting at its control', async () => {
    await open();
    testId('map-run')!.click();
    await settle();
    sweepRequest().flush(
      { error: { code: 'invalid', message: 'Part.primitives[1].radius must be greater than zero.', field: 'part.primitives[1].radius' } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(testId('error-banner')!.textContent).toContain('primitives[1].radius must be greater than zero');
    expect(testId('error-banner')!.querySelector('button')).toBeNull();

    testId('map-run')!.click();
    await settle();
    sweepRequest().flush(
      { error: { code: 'invalid', message: 'Axes[0].steps must be at most 5000.', field: 'axes[0].steps' } },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(host.querySelector('mat-error')!.textContent).toContain('Steps must be at most 5000.');
  });

  it('cancels a running sweep, and offers to try again after a failure', async () => {
    await open();
    testId('map-run')!.click();
    await settle();
    const running = sweepRequest();
    testId('map-cancel')!.click();
    await settle();
    expect(running.cancelled).toBe(true);
    expect(testId('map-cancelled')).not.toBeNull();
    expect(testId('map-sweeping')).toBeNull();

    testId('map-run')!.click();
    await settle();
    sweepRequest().flush({ error: { code: 'unavailable', message: 'The server is busy.' } }, { status: 503, statusText: 'Unavailable' });
    await settle();
    expect(testId('error-banner')!.textContent).toContain('The map was not built.');
    testId('error-banner')!.querySelector('button')!.click();
    await settle();
    sweepRequest().flush(LINE_ANSWER);
    await settle();
    expect(testId('map-result')).not.toBeNull();
  });

  it('shows a failed part load with a retry', async () => {
    await open({ partFails: true });
    expect(testId('error-banner')).not.toBeNull();
    expect(testId('map-form')).toBeNull();
    testId('error-banner')!.querySelector('button')!.click();
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(DRAFT));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([]);
    await settle();
    expect(testId('error-banner')).toBeNull();
    expect(testId('map-form')).not.toBeNull();
  });

  it('shows an empty state for a draft without primitives', async () => {
    await open({ draft: { name: 'Practice paddle', primitives: [], spin: { axis: [1, 0, 0], rate: 12 } } });
    expect(testId('map-empty')).not.toBeNull();
    expect(testId('map-form')).toBeNull();
    expect(testId('map-empty-editor')!.getAttribute('href')).toBe(`/projects/${PROJECT_ID}/parts/${PART_ID}`);
  });

  it('lets a reviewer read the map but not load a point', async () => {
    await open({ role: 'reviewer' });
    await buildMap();
    await type('finder-value-0', '100');
    await type('finder-value-1', '9');
    testId('finder-go')!.click();
    await settle();
    expect(testId('point-load')).toBeNull();
    expect(testId('point-read-only')).not.toBeNull();
  });
});
