import { Component, signal } from '@angular/core';
import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { AuthState, errorInterceptor } from '@tumblewise/api-client';
import type { Mesh, MeshUsage, Role } from '@tumblewise/shared';
import { Confirmation, type ConfirmRequest } from '@tumblewise/ui';
import { of } from 'rxjs';
import { MeshPicker } from './mesh-picker';

// An invented workspace and user.
const HARBOUR_WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const SESSION = {
  accessToken: 'token-one',
  expiresIn: 900,
  memberships: [{ workspace: HARBOUR_WORKSPACE, role: 'designer' as const }],
  user: {
    id: '5e4d3c2b-1a09-4f8e-b7d6-c5b4a3928170',
    email: 'mira.okafor@example.test',
    name: 'Mira Okafor',
    isOperator: false,
    createdAt: '2026-11-02T09:00:00.000Z',
  },
};
const mesh = (id: string, name: string, triangleCount: number, byteSize: number): Mesh => ({
  id,
  name,
  sha256: 'b'.repeat(64),
  byteSize,
  triangleCount,
  format: 'binary',
  report: { fixed: [], warnings: [] },
  createdAt: '2026-11-20T10:00:00.000Z',
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
  /** What the confirm dialog was asked, and what the user answers. */
  let asked: ConfirmRequest[];
  let answer: boolean;

  async function render(options: { value?: string; disabled?: boolean; meshes?: Mesh[]; role?: Role } = {}) {
    asked = [];
    answer = true;
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: Confirmation, useValue: { ask: (r: ConfirmRequest) => (asked.push(r), of(answer)) } },
      ],
    });
    TestBed.inject(AuthState).setSession({ ...SESSION, memberships: [{ workspace: HARBOUR_WORKSPACE, role: options.role ?? 'designer' }] });
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
    backend
      .expectOne({ method: 'POST', url: LIST_URL })
      .flush({ error: { code: 'mesh_invalid', message: refusal, field: 'file' } }, { status: 422, statusText: 'Unprocessable Entity' });
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

  describe('deleting an upload', () => {
    const usageUrl = (m: Mesh) => `${LIST_URL}/${m.id}/usage`;
    const rows = (el: HTMLElement) => [...el.querySelectorAll<HTMLElement>('[data-testid="mesh-upload-row"]')];
    const deleteButton = (el: HTMLElement, name: string) =>
      rows(el)
        .find((r) => r.textContent!.includes(name))!
        .querySelector<HTMLButtonElement>('[data-testid="mesh-delete"]')!;
    const note = (el: HTMLElement) => el.querySelector<HTMLElement>('[data-testid="mesh-delete-note"]');

    it('lists the uploads with a delete button each, and deletes one nothing uses after the user confirms', async () => {
      const { fixture, el, testId } = await render();
      expect(rows(el).map((r) => r.querySelector('.tw-mesh-upload-name')!.textContent!.trim())).toEqual([
        'club-head · 12,800 triangles · 640 kB',
        'knob · 12 triangles · 684 B',
      ]);
      expect(deleteButton(el, 'knob').getAttribute('aria-label')).toBe('Delete the mesh knob');
      expect(testId('mesh-manage')!.textContent).toContain('uploads (2)');
      deleteButton(el, 'knob').click();
      backend.expectOne({ method: 'GET', url: usageUrl(KNOB) }).flush({ parts: [] } satisfies MeshUsage);
      backend.expectOne({ method: 'DELETE', url: `${LIST_URL}/${KNOB.id}` }).flush(null, { status: 204, statusText: 'No Content' });
      expect(asked).toHaveLength(1);
      expect(asked[0]).toMatchObject({ title: 'Delete the mesh “knob”?', confirmLabel: 'Delete mesh', destructive: true });
      expect(asked[0].message).toContain('No part’s draft or saved variant uses it');
      expect(asked[0].message).toContain('the audit log records the deletion');
      TestBed.tick();
      // The list is fetched again after the deletion.
      backend.expectOne({ method: 'GET', url: LIST_URL }).flush([HEAD]);
      await fixture.whenStable();
      expect(note(el)!.textContent!.trim()).toBe('Deleted the mesh “knob”.');
      expect(note(el)!.getAttribute('role')).toBe('status');
      expect(rows(el)).toHaveLength(1);
    });

    it('deletes nothing when the user cancels', async () => {
      const { fixture, el } = await render();
      answer = false;
      deleteButton(el, 'knob').click();
      backend.expectOne({ method: 'GET', url: usageUrl(KNOB) }).flush({ parts: [] } satisfies MeshUsage);
      await fixture.whenStable();
      expect(asked).toHaveLength(1);
      backend.expectNone({ method: 'DELETE', url: `${LIST_URL}/${KNOB.id}` });
      expect(note(el)).toBeNull();
      expect(deleteButton(el, 'knob').disabled).toBe(false);
    });

    it('says which parts still use a mesh, and neither asks nor deletes', async () => {
      const { fixture, el } = await render();
      deleteButton(el, 'knob').click();
      const usage: MeshUsage = {
        parts: [
          {
            partId: '33333333-3333-4333-8333-333333333333',
            projectId: '44444444-4444-4444-8444-444444444444',
            partName: 'Head core',
            inDraft: true,
            variantNumbers: [1, 2],
          },
        ],
      };
      backend.expectOne({ method: 'GET', url: usageUrl(KNOB) }).flush(usage);
      await fixture.whenStable();
      expect(asked).toHaveLength(0);
      expect(note(el)!.textContent).toContain(
        '“knob” is still used by Head core (its draft and saved variants v1, v2), so it cannot be deleted.',
      );
      expect(note(el)!.getAttribute('role')).toBe('alert');
      expect(rows(el)).toHaveLength(2);
    });

    it('does not offer to delete the mesh this primitive uses (its draft may not be saved yet)', async () => {
      const { fixture, el } = await render({ value: HEAD.id });
      deleteButton(el, 'club-head').click();
      await fixture.whenStable();
      backend.expectNone(usageUrl(HEAD));
      expect(asked).toHaveLength(0);
      expect(note(el)!.textContent).toContain('“club-head” is the mesh of this primitive');
    });

    it('shows the server’s refusal when a draft started using the mesh meanwhile', async () => {
      const { fixture, el } = await render();
      deleteButton(el, 'knob').click();
      backend.expectOne({ method: 'GET', url: usageUrl(KNOB) }).flush({ parts: [] } satisfies MeshUsage);
      backend.expectOne({ method: 'DELETE', url: `${LIST_URL}/${KNOB.id}` }).flush(
        {
          error: {
            code: 'mesh_in_use',
            message: 'The mesh “knob” is still used by Grip trial (its draft), so it cannot be deleted.',
            field: 'meshId',
          },
        },
        { status: 409, statusText: 'Conflict' },
      );
      await fixture.whenStable();
      expect(note(el)!.textContent).toContain('still used by Grip trial (its draft)');
      expect(rows(el)).toHaveLength(2);
    });

    it('offers no deletion to reviewers', async () => {
      const readonly = await render({ value: HEAD.id, disabled: true, role: 'reviewer' });
      expect(readonly.testId('mesh-manage')).toBeNull();
      expect(readonly.el.querySelector('[data-testid="mesh-delete"]')).toBeNull();
      TestBed.resetTestingModule();
      // Even where the control is enabled, the role decides.
      const enabled = await render({ role: 'reviewer' });
      expect(enabled.testId('mesh-manage')).toBeNull();
      expect(enabled.el.querySelector('[data-testid="mesh-delete"]')).toBeNull();
    });
  });
});
