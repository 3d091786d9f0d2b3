import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatSortHarness } from '@angular/material/sort/testing';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Project, Role } from '@tumblewise/shared';
import { Projects } from './projects';

const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
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

  describe('the table', () => {
    const RACKET: Project = {
      ...JAVELIN,
      id: '40000000-0000-4000-8000-000000000002',
      name: 'Junior racket',
      category: 'racket',
      updatedAt: '2026-11-24T09:00:00.000Z',
    };
    const DISC: Project = {
      ...JAVELIN,
      id: '40000000-0000-4000-8000-000000000003',
      name: 'Flying disc 175 g',
      category: 'flying-disc',
      archived: true,
      updatedAt: '2026-11-23T09:00:00.000Z',
    };
    const names = () => Array.from(host.querySelectorAll('[data-testid="project-link"]')).map((a) => a.textContent!.trim());

    async function type(testId: string, text: string): Promise<void> {
      const input = host.querySelector<HTMLInputElement>(`[data-testid="${testId}"]`)!;
      input.value = text;
      input.dispatchEvent(new Event('input'));
      await fixture.whenStable();
    }

    it('lists the latest change first and hides archived projects until asked', async () => {
      await openAs('designer', [JAVELIN, RACKET, DISC]);
      expect(names()).toEqual(['Junior racket', 'Training javelin 600 g']);
      expect(host.querySelector('[data-testid="show-archived"]')!.textContent).toContain('Show archived (1)');
      (host.querySelector('[data-testid="show-archived"] button') as HTMLElement).click();
      await fixture.whenStable();
      expect(names()).toEqual(['Junior racket', 'Flying disc 175 g', 'Training javelin 600 g']);
      expect(host.querySelectorAll('[data-testid="archived-chip"]')).toHaveLength(1);
    });

    it('sorts by name and by category from the column headers', async () => {
      await openAs('designer', [JAVELIN, RACKET]);
      const sort = await TestbedHarnessEnvironment.loader(fixture).getHarness(MatSortHarness);
      const [nameHeader, categoryHeader] = await sort.getSortHeaders();
      await nameHeader.click();
      expect(names()).toEqual(['Junior racket', 'Training javelin 600 g']);
      await nameHeader.click();
      expect(names()).toEqual(['Training javelin 600 g', 'Junior racket']);
      await categoryHeader.click();
      expect(names()).toEqual(['Training javelin 600 g', 'Junior racket']); // "Javelin…" before "Racket"
    });

    it('filters by name or category and says when nothing matches', async () => {
      await openAs('designer', [JAVELIN, RACKET]);
      await type('projects-filter', 'RACK');
      expect(names()).toEqual(['Junior racket']);
      await type('projects-filter', 'training implement');
      expect(names()).toEqual(['Training javelin 600 g']);
      await type('projects-filter', 'paddle');
      expect(names()).toEqual([]);
      expect(host.querySelector('[data-testid="projects-no-match"]')!.textContent).toContain('No project matches "paddle"');
    });

    it('archives a project and restores it', async () => {
      await openAs('owner', [JAVELIN, RACKET]);
      (host.querySelectorAll('[data-testid="project-archive"]')[0] as HTMLElement).click();
      const archive = backend.expectOne((r) => r.method === 'PATCH' && r.url === `${URL}/${RACKET.id}`);
      expect(archive.request.body).toEqual({ archived: true });
      archive.flush({ ...RACKET, archived: true });
      await fixture.whenStable();
      expect(names()).toEqual(['Training javelin 600 g']);
      (host.querySelector('[data-testid="show-archived"] button') as HTMLElement).click();
      await fixture.whenStable();
      (host.querySelector('[data-testid="project-restore"]') as HTMLElement).click();
      const restore = backend.expectOne((r) => r.method === 'PATCH' && r.url === `${URL}/${RACKET.id}`);
      expect(restore.request.body).toEqual({ archived: false });
      restore.flush({ ...RACKET, archived: false });
      await fixture.whenStable();
      expect(host.querySelectorAll('[data-testid="project-restore"]')).toHaveLength(0);
    });

    it('renames a project through the edit dialog', async () => {
      await openAs('designer', [JAVELIN]);
      (host.querySelector('[data-testid="project-rename"]') as HTMLElement).click();
      await fixture.whenStable();
      const name = document.querySelector<HTMLInputElement>('[data-testid="edit-project-name"]')!;
      expect(name.value).toBe('Training javelin 600 g');
      name.value = 'Training javelin 500 g';
      name.dispatchEvent(new Event('input'));
      (document.querySelector('[data-testid="edit-project-save"]') as HTMLElement).click();
      const call = backend.expectOne((r) => r.method === 'PATCH' && r.url === `${URL}/${JAVELIN.id}`);
      expect(call.request.body).toEqual({ name: 'Training javelin 500 g', category: 'javelin', notes: '' });
      call.flush({ ...JAVELIN, name: 'Training javelin 500 g' });
      await fixture.whenStable();
      expect(names()).toEqual(['Training javelin 500 g']);
    });

    it('offers a reviewer no edit, archive or restore', async () => {
      await openAs('reviewer', [JAVELIN, RACKET]);
      expect(host.querySelectorAll('[data-testid="project-rename"], [data-testid="project-archive"]')).toHaveLength(0);
    });
  });
});
