import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, DOWNLOAD_FETCH, errorInterceptor } from '@tumblewise/api-client';
import type { Part, Project, Variant, VariantStatus } from '@tumblewise/shared';
import { Compare } from './compare';

// Invented workspace, part and figures (UI logic under test, not physics: the reports are minimal
// hand-written ones with round numbers so each expected cell can be read off).
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
  name: 'Practice rackets',
  category: 'racket',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const PART = {
  id: PART_ID,
  projectId: PROJECT_ID,
  name: 'Practice racket',
  draft: null,
  draftVersion: 1,
  latestVariant: null,
  variantCount: 3,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
} as Part;
const report = (mass: number, moments: [number, number, number], verdict: string) => ({
  mass,
  principal: { moments },
  spin: {
    verdict,
    nearestAxis: verdict === 'flip-prone' ? 'intermediate' : 'major',
    margins: { major: (moments[0] - moments[1]) / moments[1], minor: (moments[1] - moments[2]) / moments[1] },
  },
  trade: { balancePoint: 0.3, swingweight: null, recoilWeight: null, twistweight: null },
});
const variant = (n: number, label: string, r: unknown, status: VariantStatus = 'draft'): Variant => ({
  id: `60000000-0000-4000-8000-00000000000${n}`,
  partId: PART_ID,
  number: n,
  label,
  notes: '',
  document: {},
  report: r,
  engineVersion: 'test',
  status,
  author: null,
  version: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
});
const V1 = variant(1, 'first cut', report(0.25, [2e-3, 1.5e-3, 1e-4], 'flip-prone'), 'changes_requested');
const V2 = variant(2, 'longer throat', report(0.3, [2.5e-3, 1.5e-3, 1e-4], 'steady'));
const V3 = variant(3, '', report(0.2, [2e-3, 1e-3, 1e-4], 'steady'));

describe('Compare', () => {
  // jsdom draws no canvas; the charts (SVG) only measure text with it, and fall back without.
  beforeAll(() => (HTMLCanvasElement.prototype.getContext = (() => null) as never));

  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let fetches: { url: string; init?: RequestInit }[];
  let fetchAnswer: () => Promise<Response>;

  async function open(query: string): Promise<void> {
    localStorage.clear();
    fetches = [];
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'projects/:projectId/parts/:partId/compare', component: Compare }], withComponentInputBinding()),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        {
          provide: DOWNLOAD_FETCH,
          useValue: (url: string, init?: RequestInit) => {
            fetches.push({ url, init });
            return fetchAnswer();
          },
        },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [{ workspace: WORKSPACE, role: 'reviewer' }],
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
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/compare${query}`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(PART);
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2, V3]);
    await harness.fixture.whenStable();
    host = harness.routeNativeElement!;
  }

  afterEach(() => {
    backend.verify();
    delete (globalThis as { ResizeObserver?: unknown }).ResizeObserver;
  });

  const testId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const cells = (key: string) =>
    Array.from(host.querySelectorAll(`[data-testid="compare-row-${key}"] td`)).map((td) =>
      Array.from(td.querySelectorAll('span'))
        .map((s) => s.textContent!.trim())
        .join(' '),
    );

  it('compares the variants of the address against its baseline, in display units', async () => {
    await open(`?variants=${V1.id},${V2.id}&baseline=${V1.id}`);
    // Where the page sits, the project and part by name.
    expect(
      Array.from(host.querySelectorAll('nav[aria-label="Breadcrumb"] a, nav[aria-label="Breadcrumb"] [aria-current]')).map((e) =>
        e.textContent!.trim(),
      ),
    ).toEqual(['Projects', 'Practice rackets', PART.name, 'Compare variants']);
    const headers = Array.from(host.querySelectorAll('[data-testid="compare-column"]')).map((th) =>
      th.textContent!.replace(/\s+/g, ' ').trim(),
    );
    expect(headers).toEqual(['v1 first cut baselinepicture_as_pdf PDF', 'v2 longer throat picture_as_pdf PDF']);
    expect(cells('mass')).toEqual(['250 g', '300 g +50 g (+20 %)']);
    // 2.5e-3 kg·m² = 25,000 g·cm²; +0.5e-3 kg·m² = +5,000 g·cm² = +25 %.
    expect(cells('I1')).toEqual(['20,000 g·cm²', '25,000 g·cm² +5,000 g·cm² (+25 %)']);
    expect(cells('verdict')).toEqual(['flip-prone', 'steady']);
    expect(cells('balancePoint')).toEqual(['300 mm', '300 mm ±0 mm (±0 %)']);
  });

  it('switches the baseline and recomputes the differences and the address', async () => {
    await open(`?variants=${V1.id},${V2.id},${V3.id}`);
    expect(cells('mass')).toEqual(['250 g', '300 g +50 g (+20 %)', '200 g −50 g (−20 %)']);
    (host.querySelector('[data-testid="compare-baseline-1"] input') as HTMLInputElement).click();
    await harness.fixture.whenStable();
    expect(cells('mass')).toEqual(['250 g −50 g (−16.67 %)', '300 g', '200 g −100 g (−33.33 %)']);
    expect(TestBed.inject(Router).url).toContain(`baseline=${V2.id}`);
  });

  it('starts with the newest two variants and keeps between two and six', async () => {
    await open('');
    expect(host.querySelectorAll('[data-testid="compare-column"]')).toHaveLength(2);
    expect(cells('mass')[0]).toBe('300 g');
    (host.querySelector('[data-testid="compare-pick-3"] input') as HTMLInputElement).click();
    await harness.fixture.whenStable();
    expect(testId('compare-table')).toBeNull();
    expect(testId('compare-pick-more')!.textContent).toContain('at least 2');
    expect((testId('compare-csv') as HTMLButtonElement).disabled).toBe(true);
  });

  it('says when the address names a variant of another part', async () => {
    await open(`?variants=${V1.id},${V2.id},60000000-0000-4000-8000-000000000099`);
    expect(testId('compare-unknown')!.textContent).toContain('One variant in the link');
    expect(host.querySelectorAll('[data-testid="compare-column"]')).toHaveLength(2);
  });

  it('downloads the CSV from the server with the bearer token', async () => {
    await open(`?variants=${V1.id},${V2.id}&baseline=${V2.id}`);
    const csv = 'figure,unit,v1 first cut,v1 first cut delta\r\n';
    fetchAnswer = async () => ({ ok: true, status: 200, blob: async () => new Blob([csv], { type: 'text/csv' }) }) as Response;
    const saved: string[] = [];
    URL.createObjectURL = jest.fn(() => 'blob:compare');
    URL.revokeObjectURL = jest.fn();
    const click = jest.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    testId('compare-csv')!.click();
    await harness.fixture.whenStable();
    await new Promise((r) => setTimeout(r, 0));
    expect(fetches).toHaveLength(1);
    expect(fetches[0].url).toBe(`${BASE}/compare.csv?variants=${V1.id},${V2.id}&baseline=${V2.id}`);
    expect((fetches[0].init!.headers as Record<string, string>)['Authorization']).toBe('Bearer token-one');
    expect(saved).toEqual(['Practice-racket-comparison.csv']);
    click.mockRestore();
  });

  it('downloads one variant’s spin report as PDF', async () => {
    await open(`?variants=${V1.id},${V2.id}`);
    fetchAnswer = async () =>
      ({ ok: true, status: 200, blob: async () => new Blob(['%PDF-1.7'], { type: 'application/pdf' }) }) as Response;
    const saved: string[] = [];
    URL.createObjectURL = jest.fn(() => 'blob:pdf');
    URL.revokeObjectURL = jest.fn();
    const click = jest.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    testId('compare-pdf-1')!.click();
    await new Promise((r) => setTimeout(r, 0));
    await harness.fixture.whenStable();
    expect(fetches.map((f) => f.url)).toEqual([`${BASE}/variants/${V2.id}/export.pdf`]);
    expect(saved).toEqual(['Practice-racket-v2-longer-throat-spin-report.pdf']);
    click.mockRestore();
  });

  it('shows the server’s message when the CSV cannot be made', async () => {
    await open(`?variants=${V1.id},${V2.id}`);
    fetchAnswer = async () =>
      ({
        ok: false,
        status: 404,
        text: async () => JSON.stringify({ error: { code: 'not_found', message: 'One of the variants was not found.' } }),
      }) as Response;
    testId('compare-csv')!.click();
    await new Promise((r) => setTimeout(r, 0));
    await harness.fixture.whenStable();
    expect(testId('error-banner')!.textContent).toContain('One of the variants was not found.');
  });
});
