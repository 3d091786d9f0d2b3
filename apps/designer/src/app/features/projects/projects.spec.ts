import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Project, Role } from '@tumblewise/shared';
import { Projects } from './projects';

const WORKSPACE = { id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b', name: 'Harbour Street Gear Lab', state: 'active' as const, createdAt: '2026-11-02T09:00:00.000Z' };
const URL = `/api/v1/workspaces/${WORKSPACE.id}/projects`;

const JAVELIN: Project = {
  id: '40000000-0000-4000-8000-000000000001',
  name: 'Training javelin 600 g',
  category: 'javelin',
  notes: '',
  archived: false,
  createdAt: '2026-11-21T09:00:00.000Z',
  updatedAt: '2026-11-22T09:00:00.000Z',
};

describe('Projects', () => {
  let fixture: ComponentFixture<Projects>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  async function openAs(role: Role, projects: Project[]): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Projects],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        // Dialogs close at once instead of after an exit animation jsdom never finishes.
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: { id: '10000000-0000-4000-8000-000000000001', email: 'mira.okafor@example.test', name: 'Mira Okafor', isOperator: false, createdAt: WORKSPACE.createdAt },
      memberships: [{ workspace: WORKSPACE, role }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(Projects);
    host = fixture.nativeElement;
    fixture.detectChanges();
    expect(host.querySelector('[data-testid="loading"]')).not.toBeNull();
    backend.expectOne(URL).flush(projects);
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  it('names the next step when there are no projects', async () => {
    await openAs('designer', []);
    const empty = host.querySelector('[data-testid="projects-empty"]')!;
    expect(empty.textContent).toContain('No projects yet');
    expect(empty.textContent).toContain('Next step: create a project');
    expect(host.querySelector('[data-testid="empty-new-project"]')).not.toBeNull();
  });

  it('offers no creation to a reviewer', async () => {
    await openAs('reviewer', []);
    expect(host.querySelector('[data-testid="new-project"]')).toBeNull();
    expect(host.querySelector('[data-testid="empty-new-project"]')).toBeNull();
    expect(host.querySelector('[data-testid="projects-empty"]')?.textContent).toContain('review');
  });

  it('lists the projects with their category', async () => {
    await openAs('owner', [JAVELIN]);
    const rows = host.querySelectorAll('[data-testid="project-row"]');
    expect(rows).toHaveLength(1);
    expect(rows[0].textContent).toContain('Training javelin 600 g');
    expect(rows[0].textContent).toContain('Javelin or training implement');
  });

  it('creates a project from the dialog and shows it', async () => {
    await openAs('designer', []);
    (host.querySelector('[data-testid="empty-new-project"]') as HTMLElement).click();
    await fixture.whenStable();
    const name = document.querySelector<HTMLInputElement>('[data-testid="project-name"]')!;
    name.value = 'Junior racket';
    name.dispatchEvent(new Event('input'));
    (document.querySelector('[data-testid="project-create"]') as HTMLElement).click();
    await fixture.whenStable();
    // Category is required: nothing is sent yet.
    backend.expectNone((r) => r.method === 'POST');
    expect(document.querySelector('mat-dialog-container')?.textContent).toContain('Gear category is required.');

    (document.querySelector('[data-testid="project-category"]') as HTMLElement).click();
    await fixture.whenStable();
    (document.querySelector('[data-testid="category-racket"]') as HTMLElement).click();
    await fixture.whenStable();
    (document.querySelector('[data-testid="project-create"]') as HTMLElement).click();
    const call = backend.expectOne((r) => r.method === 'POST' && r.url === URL);
    expect(call.request.body).toEqual({ name: 'Junior racket', category: 'racket' });
    call.flush({ ...JAVELIN, id: '40000000-0000-4000-8000-000000000002', name: 'Junior racket', category: 'racket' });
    await fixture.whenStable();
    expect(host.querySelectorAll('[data-testid="project-row"]')).toHaveLength(1);
    expect(host.textContent).toContain('Junior racket');
  });
});
