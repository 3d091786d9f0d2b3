import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, errorInterceptor, WorkspaceContext } from '@tumblewise/api-client';
import { ReviewLink } from './review-link';

// Invented workspaces and ids.
const HARBOUR = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const RIDGE = {
  id: '0a9b8c7d-6e5f-4a3b-9c2d-1e0f9a8b7c6d',
  name: 'Ridgeline Throwing Club',
  state: 'active' as const,
  createdAt: '2026-11-20T09:00:00.000Z',
};
const VARIANT_ID = '60000000-0000-4000-8000-000000000003';
const PART_ID = '50000000-0000-4000-8000-000000000002';
const PROJECT_ID = '40000000-0000-4000-8000-000000000002';
const notFound = { error: { code: 'not_found', message: 'Variant not found.' } };

@Component({ template: 'part editor' })
class EditorStandIn {}

describe('ReviewLink', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;

  async function open(): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter(
          [
            { path: 'review/:variantId', component: ReviewLink },
            { path: 'projects/:projectId/parts/:partId', component: EditorStandIn },
          ],
          withComponentInputBinding(),
        ),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [
        { workspace: HARBOUR, role: 'reviewer' },
        { workspace: RIDGE, role: 'reviewer' },
      ],
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: HARBOUR.createdAt,
      },
    });
    backend = TestBed.inject(HttpTestingController);
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/review/${VARIANT_ID}`);
    TestBed.tick();
  }

  afterEach(() => backend.verify());

  it('finds the variant in another of the user’s workspaces and opens its part editor on the review panel', async () => {
    await open();
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(HARBOUR.id);
    backend.expectOne(`/api/v1/workspaces/${HARBOUR.id}/variants/${VARIANT_ID}`).flush(notFound, { status: 404, statusText: 'Not Found' });
    backend.expectOne(`/api/v1/workspaces/${RIDGE.id}/variants/${VARIANT_ID}`).flush({ id: VARIANT_ID, partId: PART_ID });
    backend.expectOne(`/api/v1/workspaces/${RIDGE.id}/parts/${PART_ID}`).flush({ id: PART_ID, projectId: PROJECT_ID });
    await harness.fixture.whenStable();
    expect(TestBed.inject(Router).url).toBe(`/projects/${PROJECT_ID}/parts/${PART_ID}?variant=${VARIANT_ID}&panel=review`);
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(RIDGE.id);
  });

  it('says so when no workspace of the user holds the variant', async () => {
    await open();
    backend.expectOne(`/api/v1/workspaces/${HARBOUR.id}/variants/${VARIANT_ID}`).flush(notFound, { status: 404, statusText: 'Not Found' });
    backend.expectOne(`/api/v1/workspaces/${RIDGE.id}/variants/${VARIANT_ID}`).flush(notFound, { status: 404, statusText: 'Not Found' });
    await harness.fixture.whenStable();
    expect(harness.routeNativeElement!.querySelector('[data-testid="review-link-not-found"]')).not.toBeNull();
    expect(TestBed.inject(Router).url).toBe(`/review/${VARIANT_ID}`);
  });

  it('offers a retry when the server fails, without trying further workspaces', async () => {
    await open();
    backend
      .expectOne(`/api/v1/workspaces/${HARBOUR.id}/variants/${VARIANT_ID}`)
      .flush({ error: { code: 'server_error', message: 'The server ran into a problem.' } }, { status: 500, statusText: 'Server Error' });
    await harness.fixture.whenStable();
    expect(harness.routeNativeElement!.querySelector('[data-testid="error-banner"]')!.textContent).toContain(
      'The server ran into a problem.',
    );
  });
});
