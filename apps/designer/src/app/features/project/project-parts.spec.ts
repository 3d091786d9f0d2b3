import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter, Router } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Part, Project, Role } from '@tumblewise/shared';
import { Confirmation } from '@tumblewise/ui';
import { of } from 'rxjs';
import { ProjectParts } from './project-parts';

const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
// Invented project and parts.
const PROJECT: Project = {
  id: '40000000-0000-4000-8000-000000000001',
  name: 'Junior racket',
  category: 'racket',
  notes: 'Lighter frame',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const part = (n: number, name: string, latest: Part['latestVariant'], variantCount: number): Part => ({
  id: `50000000-0000-4000-8000-00000000000${n}`,
  projectId: PROJECT.id,
  name,
  draft: {},
  draftVersion: 1,
  latestVariant: latest,
  variantCount,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
});
const FRAME = part(
  1,
  'Frame',
  {
    id: '60000000-0000-4000-8000-000000000001',
    number: 3,
    status: 'in_review',
    summary: { verdict: 'flip-prone', nearestAxis: 'intermediate', mass: 0.25 },
  },
  3,
);
const BUMPER = part(2, 'Bumper', null, 0);

describe('ProjectParts', () => {
  let fixture: ComponentFixture<ProjectParts>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  async function openAs(role: Role, parts: Part[]): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [ProjectParts],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: Confirmation, useValue: { ask: () => of(true) } },
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
        createdAt: WORKSPACE.createdAt,
      },
      memberships: [{ workspace: WORKSPACE, role }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(ProjectParts);
    fixture.componentRef.setInput('projectId', PROJECT.id);
    host = fixture.nativeElement;
    fixture.detectChanges();
    backend.expectOne(`${BASE}/projects/${PROJECT.id}`).flush(PROJECT);
    backend.expectOne(`${BASE}/projects/${PROJECT.id}/parts`).flush(parts);
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('lists the parts with the latest variant, its verdict and its status', async () => {
    await openAs('designer', [FRAME, BUMPER]);
    const rows = host.querySelectorAll('[data-testid="part-row"]');
    expect(rows).toHaveLength(2);
    expect(rows[0].textContent).toContain('v3');
    expect(rows[0].querySelector('[data-testid="verdict-chip"]')!.getAttribute('data-verdict')).toBe('flip-prone');
    expect(rows[0].querySelector('[data-testid="status-chip"]')!.textContent).toContain('In review');
    expect(rows[1].textContent).toContain('Draft only');
    expect(rows[1].querySelector('[data-testid="verdict-chip"]')!.textContent).toContain('No verdict yet');
  });

  it('deletes a part after confirmation', async () => {
    await openAs('designer', [FRAME, BUMPER]);
    (host.querySelectorAll('[data-testid="part-delete"]')[1] as HTMLElement).click();
    backend
      .expectOne((r) => r.method === 'DELETE' && r.url === `${BASE}/parts/${BUMPER.id}`)
      .flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(host.querySelectorAll('[data-testid="part-row"]')).toHaveLength(1);
  });

  it('creates a part with an empty starter draft and opens its editor', async () => {
    await openAs('designer', []);
    const navigate = jest.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    (host.querySelector('[data-testid="empty-new-part"]') as HTMLElement).click();
    await fixture.whenStable();
    const name = document.querySelector<HTMLInputElement>('[data-testid="part-name"]')!;
    name.value = 'Grip';
    name.dispatchEvent(new Event('input'));
    (document.querySelector('[data-testid="part-create"]') as HTMLElement).click();
    const call = backend.expectOne((r) => r.method === 'POST' && r.url === `${BASE}/projects/${PROJECT.id}/parts`);
    expect(call.request.body).toMatchObject({ name: 'Grip', draft: { category: 'racket', primitives: [], spin: { axis: [0, 0, 1] } } });
    call.flush(part(3, 'Grip', null, 0));
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith(['/projects', PROJECT.id, 'parts', '50000000-0000-4000-8000-000000000003']);
  });

  it('offers a reviewer neither creation nor deletion', async () => {
    await openAs('reviewer', [FRAME]);
    expect(host.querySelector('[data-testid="new-part"]')).toBeNull();
    expect(host.querySelector('[data-testid="part-delete"]')).toBeNull();
  });
});
