import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { ComponentFixture, DeferBlockBehavior, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { analyzePart } from '@tumblewise/engine';
import type { Part, PartDocument, Role, Variant } from '@tumblewise/shared';
import { AUTOSAVE_DEBOUNCE_MS } from './autosave-drafts';
import { ANALYSIS_DEBOUNCE_MS } from './live-analysis';
import { PartEditor } from './part-editor';

const HARBOUR_WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const BASE = `/api/v1/workspaces/${HARBOUR_WORKSPACE.id}`;

// An invented part: a baton handle.
const PART: Part = {
  id: PART_ID,
  projectId: PROJECT_ID,
  name: 'Baton',
  draftVersion: 4,
  latestVariant: null,
  variantCount: 0,
  createdAt: '2026-11-21T09:00:00.000Z',
  updatedAt: '2026-11-21T09:00:00.000Z',
  draft: {
    name: 'Baton',
    category: 'juggling',
    primitives: [
      {
        id: 'shaft',
        shape: 'cylinder',
        radius: 0.0135,
        length: 0.5,
        position: [0, 0, 0.25],
        rotationDeg: [0, 0, 0],
        density: 650,
        mode: 'add',
      },
    ],
    spin: { axis: [1, 0, 0], rate: 10 * Math.PI, misalignmentDeg: 1 },
  },
};

// jsdom has no IntersectionObserver (the @defer viewport trigger): one that never reports keeps the slots as placeholders.
class IdleIntersectionObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
  takeRecords(): [] {
    return [];
  }
}

// The first test pays for compiling the editor and loading the engine (mathjs) on a shared machine.
jest.setTimeout(30_000);

describe('PartEditor', () => {
  beforeAll(() => {
    (globalThis as { IntersectionObserver?: unknown }).IntersectionObserver ??= IdleIntersectionObserver;
  });

  let fixture: ComponentFixture<PartEditor>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  async function settle(ms = 0): Promise<void> {
    await jest.advanceTimersByTimeAsync(ms);
    fixture.detectChanges();
    await jest.advanceTimersByTimeAsync(0);
    fixture.detectChanges();
  }

  async function open(role: Role = 'designer', variants: Variant[] = [], linkedVariant?: string): Promise<void> {
    jest.useFakeTimers();
    localStorage.clear();
    TestBed.configureTestingModule({
      // The 3-D view and sign-off slots stay placeholders (they have tests of their own).
      deferBlockBehavior: DeferBlockBehavior.Manual,
      imports: [PartEditor],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: HARBOUR_WORKSPACE.createdAt,
      },
      memberships: [{ workspace: HARBOUR_WORKSPACE, role }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(PartEditor);
    fixture.componentRef.setInput('projectId', PROJECT_ID);
    fixture.componentRef.setInput('partId', PART_ID);
    if (linkedVariant) fixture.componentRef.setInput('variant', linkedVariant);
    host = fixture.nativeElement;
    fixture.detectChanges();
    await settle();
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(PART);
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush({
      id: PROJECT_ID,
      name: 'Juggling baton',
      category: 'juggling',
      notes: '',
      archived: false,
      createdAt: PART.createdAt,
      updatedAt: PART.updatedAt,
    });
    backend.expectOne(`${BASE}/materials`).flush([]);
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush(variants);
    await settle();
  }

  afterEach(() => {
    backend.verify();
    jest.useRealTimers();
  });

  const field = (name: string) => host.querySelector<HTMLInputElement>(`[data-testid="field-${name}"]`)!;
  async function type(name: string, value: string): Promise<void> {
    field(name).value = value;
    field(name).dispatchEvent(new Event('input'));
    await settle();
  }
  const analyzeCall = (): TestRequest => backend.expectOne((r) => r.method === 'POST' && r.url === '/api/v1/analyze');
  /** Answers the pending analysis as the server would, with the engine's report of the sent document. */
  function answerAnalysis(call = analyzeCall()): TestRequest {
    call.flush(analyzePart(call.request.body));
    return call;
  }

  it('shows the draft in display units and analyses it once the typing pauses', async () => {
    await open();
    expect(field('radius').value).toBe('13.5');
    expect(field('length').value).toBe('500');
    expect(field('rate').value).toBe('5');
    await settle(ANALYSIS_DEBOUNCE_MS);
    const first = analyzeCall();
    expect(first.request.params.get('workspace')).toBe(HARBOUR_WORKSPACE.id);
    answerAnalysis(first);

    await type('radius', '1');
    await type('radius', '15');
    backend.expectNone((r) => r.url === '/api/v1/analyze');
    await settle(ANALYSIS_DEBOUNCE_MS);
    const second = analyzeCall();
    expect(second.request.body.primitives[0].radius).toBeCloseTo(0.015, 12);
    answerAnalysis(second);
    await settle();
    expect(host.querySelector('[data-testid="report-mass"]')!.textContent).toContain('g');
    await settle(AUTOSAVE_DEBOUNCE_MS);
    backend.expectOne((r) => r.method === 'PATCH').flush({ ...PART, draftVersion: 5 });
    await settle();
  });

  it('marks a bad value at its field and sends nothing', async () => {
    await open();
    await settle(ANALYSIS_DEBOUNCE_MS);
    answerAnalysis();
    await type('length', '-5');
    await settle(ANALYSIS_DEBOUNCE_MS);
    backend.expectNone((r) => r.url === '/api/v1/analyze');
    expect(host.querySelector('[data-testid="report-stale"]')).not.toBeNull();
    expect(host.textContent).toContain('Length must be greater than zero.');
    await settle(AUTOSAVE_DEBOUNCE_MS);
    // A draft may be invalid: it is still autosaved, so nothing typed is lost.
    backend.expectOne((r) => r.method === 'PATCH').flush({ ...PART, draftVersion: 5 });
    await settle();
  });

  it('autosaves with the loaded draftVersion and, on 409, keeps the edits and offers to reload', async () => {
    await open();
    await settle(ANALYSIS_DEBOUNCE_MS);
    answerAnalysis();
    await type('length', '600');
    await settle(ANALYSIS_DEBOUNCE_MS);
    answerAnalysis();
    await settle(AUTOSAVE_DEBOUNCE_MS);
    const save = backend.expectOne((r) => r.method === 'PATCH' && r.url === `${BASE}/parts/${PART_ID}`);
    expect(save.request.body.draftVersion).toBe(4);
    expect(save.request.body.draft.primitives[0].length).toBeCloseTo(0.6, 12);
    save.flush(
      { error: { code: 'stale_version', message: 'Someone saved this part after you loaded it.', field: 'draftVersion' } },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    expect(host.querySelector('[data-testid="conflict-banner"]')!.textContent).toContain('Someone else saved this part');
    expect(field('length').value).toBe('600');

    // Further edits stay local while the conflict is open.
    await type('length', '650');
    await settle(AUTOSAVE_DEBOUNCE_MS + ANALYSIS_DEBOUNCE_MS);
    backend.expectNone((r) => r.method === 'PATCH');
    answerAnalysis();

    (host.querySelector('[data-testid="conflict-reload"]') as HTMLElement).click();
    const theirs = {
      ...PART,
      draftVersion: 7,
      draft: { ...(PART.draft as object), primitives: [{ ...(PART.draft as { primitives: object[] }).primitives[0], length: 0.45 }] },
    };
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(theirs);
    await settle();
    expect(host.querySelector('[data-testid="conflict-banner"]')).toBeNull();
    expect(field('length').value).toBe('450');
    // Undo brings the local edits back.
    (host.querySelector('[data-testid="undo"]') as HTMLElement).click();
    await settle();
    expect(field('length').value).toBe('650');
    await settle(ANALYSIS_DEBOUNCE_MS);
    answerAnalysis();
    await settle(AUTOSAVE_DEBOUNCE_MS);
    const again = backend.expectOne((r) => r.method === 'PATCH');
    expect(again.request.body.draftVersion).toBe(7);
    again.flush({ ...PART, draftVersion: 8 });
    await settle();
  });

  it('shows a reviewer the part read-only and saves nothing', async () => {
    await open('reviewer');
    expect(field('radius').disabled).toBe(true);
    expect(host.querySelector('[data-testid="save-variant"]')).toBeNull();
    expect(host.querySelector('[data-testid="add-box"]')).toBeNull();
    expect(host.querySelector('[data-testid="primitive-delete"]')).toBeNull();
    await settle(ANALYSIS_DEBOUNCE_MS + AUTOSAVE_DEBOUNCE_MS);
    answerAnalysis();
    backend.expectNone((r) => r.method === 'PATCH');
  });

  it('saves a variant and shows a server refusal at its field, keeping the draft', async () => {
    await open();
    await settle(ANALYSIS_DEBOUNCE_MS);
    answerAnalysis();
    (host.querySelector('[data-testid="save-variant"]') as HTMLElement).click();
    await settle();
    const label = document.querySelector<HTMLInputElement>('[data-testid="variant-label"]')!;
    label.value = 'Thicker shaft';
    label.dispatchEvent(new Event('input'));
    (document.querySelector('[data-testid="variant-save-confirm"]') as HTMLElement).click();
    await settle();
    const post = backend.expectOne((r) => r.method === 'POST' && r.url === `${BASE}/parts/${PART_ID}/variants`);
    expect(post.request.body).toMatchObject({ label: 'Thicker shaft', document: { primitives: [{ id: 'shaft', radius: 0.0135 }] } });
    post.flush(
      {
        error: {
          code: 'unanalysable',
          message: 'Primitives[0].density leaves no mass after the removals.',
          field: 'primitives[0].density',
        },
      },
      { status: 422, statusText: 'Unprocessable Entity' },
    );
    await settle();
    expect(host.querySelector('[data-testid="error-banner"]')!.textContent).toContain('The variant was not saved.');
    expect(host.querySelector('[data-testid="error-density"]')!.textContent).toContain('Density leaves no mass after the removals.');
    expect(host.querySelectorAll('[data-testid="variant-row"]')).toHaveLength(0);
  });

  it('opens the variant named in the address (the review e-mail link) once the list has loaded', async () => {
    const document = PART.draft as PartDocument;
    const linked: Variant = {
      id: '30000000-0000-4000-8000-000000000007',
      partId: PART_ID,
      number: 4,
      label: 'linked',
      notes: '',
      document,
      report: analyzePart(document),
      engineVersion: 'engine test',
      status: 'in_review',
      author: null,
      version: 2,
      createdAt: PART.createdAt,
      updatedAt: PART.updatedAt,
    };
    await open('reviewer', [linked], linked.id);
    expect(host.querySelector('[data-testid="back-to-live"]')).not.toBeNull();
    expect(host.querySelector('[data-testid="sign-off-slot"]')?.getAttribute('data-variant-id')).toBe(linked.id);
    expect(host.textContent).toContain('linked');

    // Closed by the reader, it stays closed: the address opens it once.
    host.querySelector<HTMLButtonElement>('[data-testid="back-to-live"]')!.click();
    await settle();
    expect(host.querySelector('[data-testid="sign-off-slot"]')).toBeNull();
  });
});
