import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MeshesApi, WorkspaceContext } from '@tumblewise/api-client';
import type { SpinReport } from '@tumblewise/engine';
import type { PartDocument } from '@tumblewise/shared';
// The viewer (and three.js) load in the @defer block: keep its import on its own line, so the
// compiler can make it lazy; the token and types below come without three.js.
import { TwPartViewer } from '@tumblewise/viewer';
import { MESH_GEOMETRY_SOURCE, type MeshGeometrySource, type UploadedMeshStatus } from '@tumblewise/viewer';
import { firstValueFrom } from 'rxjs';

/** The viewer's uploaded meshes come from the current workspace's stored STL files. */
function workspaceMeshSource(): MeshGeometrySource {
  const api = inject(MeshesApi);
  const workspace = inject(WorkspaceContext);
  return (meshId) => {
    const workspaceId = workspace.workspaceId();
    if (!workspaceId) return Promise.reject(new Error('no workspace is open'));
    return firstValueFrom(api.geometry(workspaceId, meshId));
  };
}

/**
 * The slot of the 3-D view and tumble preview (`TwPartViewer` from `@tumblewise/viewer`). The viewer
 * and three.js load in their own chunk when the slot scrolls into view (@defer), and only once there
 * is a report: it draws the document that report was computed from, so picture and figures agree.
 */
@Component({
  selector: 'tw-viewer-slot',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [TwPartViewer],
  providers: [{ provide: MESH_GEOMETRY_SOURCE, useFactory: workspaceMeshSource }],
  template: `
    <section class="tw-viewer-slot" aria-label="3-D view" data-testid="viewer-slot">
      @defer (on viewport) {
        @if (document() && report()) {
          <tw-part-viewer
            [document]="document()!"
            [report]="report()!"
            [workspaceId]="workspaceId()"
            (uploadedMeshes)="meshes.set($event)"
          />
          @for (f of meshes().failed; track f.id) {
            <p class="tw-mesh-note" role="status" data-testid="viewer-mesh-note">
              The uploaded mesh “{{ f.id }}” is not drawn ({{ f.message }}); the spin report still counts it.
            </p>
          }
        } @else {
          <div class="tw-placeholder" data-testid="viewer-placeholder">
            <span class="material-icons" aria-hidden="true">view_in_ar</span>
            <p>The 3-D view and tumble preview appear once the part has a spin report.</p>
          </div>
        }
      } @placeholder {
        <div class="tw-placeholder"><p>3-D view</p></div>
      } @loading {
        <div class="tw-placeholder"><p>Loading the 3-D view…</p></div>
      }
    </section>
  `,
  styles: `
    .tw-viewer-slot {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      min-height: 160px;
      background: var(--mat-sys-surface-container-low);
      color: var(--mat-sys-on-surface-variant);
      overflow: hidden;
    }
    .tw-placeholder {
      display: grid;
      place-items: center;
      text-align: center;
      min-height: 160px;
      padding: 16px;
    }
    .material-icons {
      font-size: 36px;
    }
    .tw-mesh-note {
      margin: 0;
      padding: 8px 16px;
      font: var(--mat-sys-body-small);
    }
  `,
})
export class ViewerSlot {
  /** The (valid) part document the report was computed from, or null. */
  readonly document = input<PartDocument | null>(null);
  /** Its spin report, or null. */
  readonly report = input<SpinReport | null>(null);
  /** The current workspace: the viewer's motion request resolves the document's mesh references there. */
  protected readonly workspaceId = inject(WorkspaceContext).workspaceId;
  /** Where the viewer's uploaded meshes stand (a note for each that could not be drawn). */
  protected readonly meshes = signal<UploadedMeshStatus>({ drawn: [], pending: [], failed: [] });
}
