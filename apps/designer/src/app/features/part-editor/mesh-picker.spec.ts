import { Component, signal } from '@angular/core';
import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { AuthState, errorInterceptor } from '@tumblewise/api-client';
import type { Mesh } from '@tumblewise/shared';
import { MeshPicker } from './mesh-picker';

// An invented workspace and user.
const HARBOUR_WORKSPACE = { id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b', name: 'Harbour Street Gear Lab', state: 'active' as const, createdAt: '2026-11-02T09:00:00.000Z' };
const SESSION = {
  accessToken: 'token-one', expiresIn: 900, memberships: [{ workspace: HARBOUR_WORKSPACE, role: 'designer' as const }],
  user: { id: '5e4d3c2b-1a09-4f8e-b7d6-c5b4a3928170', email: 'mira.okafor@example.test', name: 'Mira Okafor', isOperator: false, createdAt: '2026-11-02T09:00:00.000Z' },
};
const mesh = (id: string, name: string, triangleCount: number, byteSize: number): Mesh => ({
  id, name, sha256: 'b'.repeat(64), byteSize, triangleCount, format: 'binary', report: { fixed: [], warnings: [] }, createdAt: '2026-11-20T10:00:00.000Z',
});
const HEAD = mesh('11111111-1111-4111-8111-111111111111', 'club-head', 12_800, 640_084);
const KNOB = mesh('22222222-2222-4222-8222-222222222222', 'knob', 12, 684);
const LIST_URL = `/api/v1/workspaces/${HARBOUR_WORKSPACE.id}/meshes`;

@Component({
  imports: [ReactiveFormsModule, MeshPicker],
  template: `<tw-mesh-picker [formControl]="control" [problem]="problem()" />`,
})
class Host {
  readonly control = new FormControl<string>('');
  readonly problem = signal<string | null>(null);
}

describe('MeshPicker', () => {
  let backend: HttpTestingController;

  async function render(options: { value?: string; disabled?: boolean; meshes?: Mesh[] } = {}) {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
      ],
    });
    TestBed.inject(AuthState).setSession(SESSION);
    backend = TestBed.inject(HttpTestingController);
    const fixture = TestBed.createComponent(Host);
    const host = fixture.componentInstance;
    host.control.setValue(options.value ?? '');
    if (options.disabled) host.control.disable();
    fixture.detectChanges();
    backend.expectOne({ method: 'GET', url: LIST_URL }).flush(options.meshes ?? [HEAD, KNOB]);
    await fixture.whenStable();
    const el: HTMLElement = fixture.nativeElement;
    const testId = (id: string) => el.querySelector<HTMLElement>(`[data-testid="${id}"]`);
    const pick = async (name: string, content: BlobPart[] = [new Uint8Array(684)]) => {
      const input = testId('mesh-file') as HTMLInputElement;
      const file = new File(content, name);
      Object.defineProperty(input, 'files', { value: [file], configurable: true });
      input.dispatchEvent(new Event('change'));
      await fixture.whenStable();
    };
    return { fixture, host, el, testId, pick };
  }

  afterEach(() => backend.verify());

  it('lists the workspace’s meshes by name, triangle count and size, and sets the control to the one chosen', async () => {
    const { fixture, host, el, testId } = await render();
    testId('field-meshId')!.click();
    await fixture.whenStable();
    const options = [...document.querySelectorAll<HTMLElement>('[data-testid="mesh-option"]')];
    expect(options.map((o) => o.textContent!.trim())).toEqual(['club-head · 12,800 triangles · 640 kB', 'knob · 12 triangles · 684 B']);
    options[1].click();
    await fixture.whenStable();
    expect(host.control.value).toBe(KNOB.id);
    expect(el.textContent).toContain('Checked: a closed solid');
    expect(el.textContent).toContain('0.001 if the file is in mm');
  });

  it('uploads a picked STL, shows the progress and the check, then selects the new mesh', async () => {
    const { fixture, host, el, testId, pick } = await render();
    await pick('wing-tip.stl');
    const call = backend.expectOne({ method: 'POST', url: LIST_URL });
    expect(((call.request.body as FormData).get('file') as File).name).toBe('wing-tip.stl');
    expect((call.request.body as FormData).get('name')).toBe('wing-tip');
    call.event({ type: HttpEventType.UploadProgress, loaded: 342, total: 684 });
    await fixture.whenStable();
    expect(testId('mesh-progress')!.textContent).toContain('Uploading wing-tip.stl… 50 %');
    expect(testId('mesh-upload')!.hasAttribute('disabled')).toBe(true);
    call.event({ type: HttpEventType.UploadProgress, loaded: 684, total: 684 });
    await fixture.whenStable();
    expect(testId('mesh-progress')!.textContent).toContain('Checking the mesh in wing-tip.stl…');
    const created = mesh('33333333-3333-4333-8333-333333333333', 'wing-tip', 12, 684);
    call.flush(created, { status: 201, statusText: 'Created' });
    expect(host.control.value).toBe(created.id);
    TestBed.tick();
    // The list is fetched again after the upload.
    backend.expectOne({ method: 'GET', url: LIST_URL }).flush([created, HEAD, KNOB]);
    await fixture.whenStable();
    expect(host.control.value).toBe(created.id);
    expect(testId('mesh-progress')).toBeNull();
    expect(el.querySelector('.mat-mdc-select-value')!.textContent).toContain('wing-tip · 12 triangles');
  });

  it('shows the server’s reason at the field when the file is refused, and keeps the choice', async () => {
    const { fixture, host, testId, pick } = await render({ value: HEAD.id });
    await pick('open.stl');
    const refusal = 'The STL cannot be used: the mesh is not closed: 4 edges belong to one triangle only.';
    backend.expectOne({ method: 'POST', url: LIST_URL }).flush({ error: { code: 'mesh_invalid', message: refusal, field: 'file' } }, { status: 422, statusText: 'Unprocessable Entity' });
    await fixture.whenStable();
    expect(testId('mesh-error')!.textContent).toContain(refusal);
    expect(testId('mesh-error')!.getAttribute('role')).toBe('alert');
    expect(host.control.value).toBe(HEAD.id);
    expect(testId('mesh-progress')).toBeNull();
  });

  it('refuses a file that is not .stl without sending it', async () => {
    const { testId, pick } = await render();
    await pick('drawing.pdf');
    expect(testId('mesh-error')!.textContent).toContain('not an .stl file');
    backend.expectNone({ method: 'POST', url: LIST_URL });
  });

  it('shows a problem the document check found with the reference', async () => {
    const { fixture, host, testId } = await render({ value: 'gone' });
    expect(testId('mesh-unknown')!.textContent).toContain('not among this workspace’s uploads');
    host.problem.set('Mesh is not a known mesh (gone)');
    await fixture.whenStable();
    expect(testId('mesh-error')!.textContent).toContain('is not a known mesh');
  });

  it('shows reviewers the mesh’s name and no upload', async () => {
    const { testId } = await render({ value: HEAD.id, disabled: true });
    expect(testId('mesh-name')!.textContent).toContain('club-head · 12,800 triangles');
    expect(testId('mesh-upload')).toBeNull();
    expect(testId('mesh-file')).toBeNull();
    expect(testId('field-meshId')).toBeNull();
  });
});
