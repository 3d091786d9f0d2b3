import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { runScatterStudy } from '@tumblewise/engine';
import type { Material, Part, Project, PartDocument, Role, ScatterStudy, Variant } from '@tumblewise/shared';
import { SCATTER_POLL_MS, ScatterStudyPage } from './scatter-study';

// Invented workspace, part and material; the study's result is computed by the engine here.
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const STUDY_ID = '90000000-0000-4000-8000-000000000001';
const PROJECT: Project = {
  id: PROJECT_ID,
  name: 'Practice batons',
  category: 'juggling',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const PART = {
  id: PART_ID,
  projectId: PROJECT_ID,
  name: 'Practice baton',
  draft: null,
  draftVersion: 1,
  latestVariant: null,
  variantCount: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
} as Part;
const MAPLE = {
  id: '80000000-0000-4000-8000-000000000002',
  name: 'Maple (test)',
  family: 'wood',
  density: 700,
  densityTolerance: 0.07,
  source: 'test',
  scope: 'library',
  createdAt: WORKSPACE.createdAt,
} as Material;
const DOC = {
  name: 'Practice baton',
  primitives: [
    {
      id: 'shaft',
      shape: 'cylinder',
      radius: 0.012,
      length: 0.5,
      position: [0, 0, 0.25],
      rotationDeg: [0, 0, 0],
      materialId: MAPLE.id,
      mode: 'add',
    },
    { id: 'knob', shape: 'sphere', radius: 0.025, position: [0, 0, 0.52], rotationDeg: [0, 0, 0], density: 1100, mode: 'add' },
    { id: 'weight', shape: 'point', mass: 0.02, position: [0, 0, 0.05], rotationDeg: [0, 0, 0], mode: 'add' },
  ],
  spin: { axis: [1, 0, 0], rate: 12, misalignmentDeg: 1 },
  dissipative: false,
} as PartDocument;
const VARIANT: Variant = {
  id: '60000000-0000-4000-8000-000000000001',
  partId: PART_ID,
  number: 1,
  label: 'first cut',
  notes: '',
  document: DOC,
  report: {},
  engineVersion: 'test',
  status: 'draft',
  author: null,
  version: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const study = (state: ScatterStudy['state'], progress: number, result: unknown = null): ScatterStudy => ({
  id: STUDY_ID,
  variantId: VARIANT.id,
  state,
  progress,
  samples: 400,
  seed: 7,
  result,
  error: null,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
});

describe('ScatterStudyPage', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeAll(() => (HTMLCanvasElement.prototype.getContext = (() => null) as never));

  async function open(role: Role = 'designer'): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'projects/:projectId/parts/:partId/scatter', component: ScatterStudyPage }], withComponentInputBinding()),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: SCATTER_POLL_MS, useValue: 0 },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [{ workspace: WORKSPACE, role }],
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
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/scatter?variant=${VARIANT.id}`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(PART);
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([VARIANT]);
    backend.expectOne(`${BASE}/materials`).flush([MAPLE]);
    await harness.fixture.whenStable();
    host = harness.routeNativeElement!;
  }

  afterEach(() => {
    backend.verify();
    delete (globalThis as { ResizeObserver?: unknown }).ResizeObserver;
  });

  const testId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const input = (id: string) => testId(id) as HTMLInputElement;
  const type = (id: string, value: string) => {
    input(id).value = value;
    input(id).dispatchEvent(new Event('input'));
  };
  /** Lets the zero-delay poll timer fire and the view catch up. */
  const tick = async () => {
    await new Promise((r) => setTimeout(r, 0));
    harness.fixture.detectChanges();
  };

  it('fills the tolerances from the material and the ±5 % allowance', async () => {
    await open();
    // Where the page sits, the project and part by name.
    expect(
      Array.from(host.querySelectorAll('nav[aria-label="Breadcrumb"] a, nav[aria-label="Breadcrumb"] [aria-current]')).map((e) =>
        e.textContent!.trim(),
      ),
    ).toEqual(['Projects', 'Practice batons', PART.name, 'Scatter study']);
    expect(input('scatter-density-shaft').value).toBe('7');
    expect(testId('scatter-source-shaft')!.textContent).toContain('Maple (test)');
    expect(input('scatter-density-knob').value).toBe('5');
    expect(input('scatter-size-shaft').value).toBe('0');
    expect(testId('scatter-size-weight')).toBeNull();
    expect(input('scatter-samples').value).toBe('2000');
  });

  it('refuses out-of-range input in the form and sends nothing', async () => {
    await open();
    type('scatter-density-knob', '60');
    type('scatter-samples', '5');
    testId('scatter-start')!.click();
    await harness.fixture.whenStable();
    backend.expectNone(`${BASE}/scatter`);
    expect(host.textContent).toContain('Density scatter');
    expect(host.querySelectorAll('mat-error').length).toBeGreaterThanOrEqual(2);
  });

  it('starts with SI tolerances, follows the progress, and cancels', async () => {
    await open();
    type('scatter-size-shaft', '0.2');
    type('scatter-samples', '400');
    type('scatter-seed', '7');
    testId('scatter-start')!.click();
    const start = backend.expectOne(`${BASE}/scatter`);
    expect(start.request.method).toBe('POST');
    expect(start.request.body).toEqual({
      variantId: VARIANT.id,
      tolerances: { shaft: { density: 0.07, size: 0.0002 }, knob: { density: 0.05, size: 0 }, weight: { density: 0.05 } },
      samples: 400,
      seed: 7,
    });
    start.flush(study('queued', 0), { status: 202, statusText: 'Accepted' });
    await tick();
    backend.expectOne(`${BASE}/scatter/${STUDY_ID}`).flush(study('running', 0.4));
    await tick();
    expect(testId('scatter-state')!.getAttribute('data-state')).toBe('running');
    expect(testId('scatter-state')!.textContent).toContain('40%');
    expect(testId('scatter-progress-bar')!.getAttribute('aria-valuenow')).toBe('40');
    // The next look is under way when the designer cancels.
    const pending = backend.expectOne(`${BASE}/scatter/${STUDY_ID}`);
    testId('scatter-cancel')!.click();
    const cancel = backend.expectOne(`${BASE}/scatter/${STUDY_ID}/cancel`);
    expect(cancel.request.method).toBe('POST');
    cancel.flush(study('cancelled', 0.4));
    await tick();
    expect(pending.cancelled).toBe(true);
    expect(testId('scatter-state')!.getAttribute('data-state')).toBe('cancelled');
    expect(testId('scatter-cancel')).toBeNull();
    await tick();
    backend.expectNone(`${BASE}/scatter/${STUDY_ID}`);
  });

  it('shows the histograms, the verdict change share and the ranking when done', async () => {
    await open();
    const result = runScatterStudy(
      { part: DOC, samples: 400, seed: 7, tolerances: { primitives: { shaft: { density: 0.07, size: 0.0002 } } } },
      undefined,
      {
        resolveMaterial: (id) => (id === MAPLE.id ? { density: MAPLE.density, tolerance: { density: MAPLE.densityTolerance } } : undefined),
      },
    );
    testId('scatter-start')!.click();
    backend.expectOne(`${BASE}/scatter`).flush(study('running', 0.1), { status: 202, statusText: 'Accepted' });
    await tick();
    backend.expectOne(`${BASE}/scatter/${STUDY_ID}`).flush(study('done', 1, result));
    await tick();
    await tick();
    backend.expectNone(`${BASE}/scatter/${STUDY_ID}`);
    expect(testId('scatter-result')).not.toBeNull();
    expect(testId('scatter-histogram-marginMajor')).not.toBeNull();
    expect(testId('scatter-histogram-marginMinor')).not.toBeNull();
    expect(testId('scatter-verdict-changed')!.textContent!.trim()).toBe(
      `${(Math.round(result.verdictChangedShare * 1000) / 10).toString()}%`,
    );
    const rows = host.querySelectorAll('[data-testid="scatter-ranking-row"]');
    expect(rows.length).toBe(Math.min(8, result.sensitivities.length));
    expect(rows[0].textContent).toContain(result.sensitivities[0].primitiveId);
    expect(testId('scatter-first-lever')!.textContent).toContain(result.sensitivities[0].primitiveId);
  });

  it('shows why a study failed', async () => {
    await open();
    testId('scatter-start')!.click();
    backend
      .expectOne(`${BASE}/scatter`)
      .flush(
        { ...study('failed', 0), error: 'the tolerances are so wide that most draws break a shape rule' },
        { status: 202, statusText: 'Accepted' },
      );
    await tick();
    expect(testId('scatter-progress')!.textContent).toContain('most draws break a shape rule');
    backend.expectNone(`${BASE}/scatter/${STUDY_ID}`);
  });

  it('lets a reviewer read but not start', async () => {
    await open('reviewer');
    expect((testId('scatter-start') as HTMLButtonElement).disabled).toBe(true);
    expect(testId('scatter-read-only')).not.toBeNull();
  });
});
