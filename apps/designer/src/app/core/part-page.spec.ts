import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Part, Project, Variant } from '@tumblewise/shared';
import { chooseVariant, partPage, type PartPage, variantLabel } from './part-page';

// Invented workspace, project, part and variants (page wiring under test, no figures).
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const OTHER_PART_ID = '50000000-0000-4000-8000-000000000002';
const PROJECT: Project = {
  id: PROJECT_ID,
  name: 'Practice batons',
  category: 'juggling',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const part = (id: string, name: string) =>
  ({
    id,
    projectId: PROJECT_ID,
    name,
    draft: null,
    draftVersion: 1,
    latestVariant: null,
    variantCount: 2,
    createdAt: WORKSPACE.createdAt,
    updatedAt: WORKSPACE.createdAt,
  }) as Part;
const variant = (n: number, label: string): Variant => ({
  id: `60000000-0000-4000-8000-00000000000${n}`,
  partId: PART_ID,
  number: n,
  label,
  notes: '',
  document: {},
  report: {},
  engineVersion: 'test',
  status: 'draft',
  author: null,
  version: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
});
const V1 = variant(1, 'first cut');
const V2 = variant(2, 'heavier knob');
const V3 = variant(3, '');

describe('variantLabel', () => {
  it('writes the number and, when there is one, the label', () => {
    expect(variantLabel(V1)).toBe('v1 first cut');
    expect(variantLabel(V3)).toBe('v3');
  });
});

describe('chooseVariant', () => {
  it('takes the asked variant, else the newest (the last of the oldest-first list)', () => {
    expect(chooseVariant([V1, V2, V3], V2.id)).toBe(V2);
    expect(chooseVariant([V1, V2, V3], undefined)).toBe(V3);
    expect(chooseVariant([V1, V2, V3], '')).toBe(V3);
  });

  it('is null when the address names no variant of the list, or the list is empty', () => {
    expect(chooseVariant([V1, V2], '60000000-0000-4000-8000-000000000099')).toBeNull();
    expect(chooseVariant([], undefined)).toBeNull();
    expect(chooseVariant([], V1.id)).toBeNull();
  });
});

describe('partPage', () => {
  let backend: HttpTestingController;
  const partId = signal(PART_ID);
  const projectId = signal(PROJECT_ID);
  const asked = signal<string | undefined>(undefined);

  function start(signedIn = true): void {
    localStorage.clear();
    partId.set(PART_ID);
    projectId.set(PROJECT_ID);
    asked.set(undefined);
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    if (signedIn) {
      TestBed.inject(AuthState).setSession({
        accessToken: 'token-one',
        expiresIn: 900,
        memberships: [{ workspace: WORKSPACE, role: 'designer' }],
        user: {
          id: '10000000-0000-4000-8000-000000000001',
          email: 'mira@example.test',
          name: 'Mira Okafor',
          isOperator: false,
          createdAt: WORKSPACE.createdAt,
        },
      });
    }
    backend = TestBed.inject(HttpTestingController);
  }

  function make(inputs: Parameters<typeof partPage>[0]): PartPage {
    const page = TestBed.runInInjectionContext(() => partPage(inputs));
    TestBed.tick();
    return page;
  }

  /** Lets the answered requests reach the resources. */
  async function settle(): Promise<void> {
    await new Promise((r) => setTimeout(r, 0));
    TestBed.tick();
  }

  afterEach(() => backend.verify());

  it('loads the part and its variants of the current workspace, and shows the newest without ?variant=', async () => {
    start();
    const page = make({ partId, variant: asked });
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2, V3]);
    // No projectId given: the project is not asked for.
    backend.expectNone(`${BASE}/projects/${PROJECT_ID}`);
    await settle();
    expect(page.part.value()?.name).toBe('Practice baton');
    expect(page.list()).toEqual([V1, V2, V3]);
    expect(page.chosen()).toBe(V3);
    expect(page.loadError()).toBeNull();
  });

  it('follows ?variant= and is null for a variant that is not this part’s', async () => {
    start();
    asked.set(V1.id);
    const page = make({ partId, variant: asked });
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2]);
    await settle();
    expect(page.chosen()).toBe(V1);
    asked.set(V2.id);
    expect(page.chosen()).toBe(V2);
    asked.set('60000000-0000-4000-8000-000000000099');
    expect(page.chosen()).toBeNull();
    asked.set(undefined);
    expect(page.chosen()).toBe(V2);
  });

  it('has no chosen variant before the list arrives, and none on a page without ?variant= input but the newest', async () => {
    start();
    const page = make({ partId });
    expect(page.chosen()).toBeNull();
    expect(page.list()).toEqual([]);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2]);
    await settle();
    expect(page.chosen()).toBe(V2);
  });

  it('loads the project too when the page names it', async () => {
    start();
    const page = make({ projectId, partId, variant: asked });
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1]);
    await settle();
    expect(page.project.value()?.name).toBe('Practice batons');
  });

  it('loads again for another part', async () => {
    start();
    const page = make({ partId });
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2]);
    await settle();
    partId.set(OTHER_PART_ID);
    TestBed.tick();
    backend.expectOne(`${BASE}/parts/${OTHER_PART_ID}`).flush(part(OTHER_PART_ID, 'Club head'));
    backend.expectOne(`${BASE}/parts/${OTHER_PART_ID}/variants`).flush([]);
    await settle();
    expect(page.part.value()?.name).toBe('Club head');
    expect(page.chosen()).toBeNull();
  });

  it('says why the variants could not be loaded, and reload asks again', async () => {
    start();
    const page = make({ projectId, partId });
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend
      .expectOne(`${BASE}/parts/${PART_ID}/variants`)
      .flush({ error: { code: 'server_error', message: 'The variants are resting.' } }, { status: 500, statusText: 'Server Error' });
    await settle();
    expect(page.loadError()).toBe('The variants are resting.');
    page.reload();
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1]);
    await settle();
    expect(page.loadError()).toBeNull();
    expect(page.chosen()).toBe(V1);
  });

  it('a project that cannot be read is no load error (it only names a breadcrumb)', async () => {
    start();
    const page = make({ projectId, partId });
    backend
      .expectOne(`${BASE}/projects/${PROJECT_ID}`)
      .flush({ error: { code: 'not_found', message: 'Project was not found.' } }, { status: 404, statusText: 'Not Found' });
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(part(PART_ID, 'Practice baton'));
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1]);
    await settle();
    expect(page.project.error()).toBeTruthy();
    expect(page.loadError()).toBeNull();
  });

  it('asks for nothing without a current workspace', async () => {
    start(false);
    const page = make({ projectId, partId, variant: asked });
    await settle();
    backend.expectNone(() => true);
    expect(page.chosen()).toBeNull();
    expect(page.loadError()).toBeNull();
  });
});
