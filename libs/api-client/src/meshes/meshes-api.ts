import { HttpClient, HttpEventType, type HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Mesh, MeshUsage } from '@tumblewise/shared';
import { filter, map, Observable, type OperatorFunction } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/**
 * How an STL upload is going. The server checks the file (closed, manifold, oriented, finite) in the
 * same request, so once every byte is sent the wait is the check. `fraction` is null when the
 * browser's transport does not report upload progress (the fetch backend); the screen then shows
 * one combined "uploading and checking" state.
 */
export type MeshUploadEvent = { kind: 'uploading'; fraction: number | null } | { kind: 'checking' } | { kind: 'done'; mesh: Mesh };

/** Uploaded meshes of a workspace (`/workspaces/:id/meshes`): STL solids that mesh primitives refer to by id. */
@Injectable({ providedIn: 'root' })
export class MeshesApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  private url(workspaceId: string, meshId?: string): string {
    const root = `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/meshes`;
    return meshId === undefined ? root : `${root}/${encodeURIComponent(meshId)}`;
  }

  /** The workspace's meshes, newest first (without their bytes). */
  list(workspaceId: string): Observable<Mesh[]> {
    return this.http.get<Mesh[]>(this.url(workspaceId));
  }

  /** One mesh's name, size, triangle count and check report. */
  get(workspaceId: string, meshId: string): Observable<Mesh> {
    return this.http.get<Mesh>(this.url(workspaceId, meshId));
  }

  /**
   * Uploads an STL (binary or ASCII) as multipart field `file`, with an optional display name. The
   * stream reports progress, then completes after one `done` event; a file the check refuses fails
   * with the server's ApiError (422 `mesh_invalid` or 413 `too_large`, field `file`), and nothing is stored.
   */
  upload(workspaceId: string, file: Blob, fileName: string, name?: string): Observable<MeshUploadEvent> {
    const form = new FormData();
    form.append('file', file, fileName);
    if (name !== undefined && name.trim() !== '') form.append('name', name.trim());
    return this.http.post<Mesh>(this.url(workspaceId), form, { reportProgress: true, observe: 'events' }).pipe(uploadEvents());
  }

  /** The parts whose draft or saved variants use the mesh (a mesh in use cannot be deleted). */
  usage(workspaceId: string, meshId: string): Observable<MeshUsage> {
    return this.http.get<MeshUsage>(`${this.url(workspaceId, meshId)}/usage`);
  }

  /** Deletes a mesh (designers and up); a mesh in use fails with 409 `mesh_in_use`, naming the parts. */
  delete(workspaceId: string, meshId: string): Observable<void> {
    return this.http.delete<void>(this.url(workspaceId, meshId));
  }

  /** The stored STL file's bytes, to draw it (parse with an STL reader; units are the file's own). */
  geometry(workspaceId: string, meshId: string): Observable<ArrayBuffer> {
    return this.http.get(`${this.url(workspaceId, meshId)}/geometry`, { responseType: 'arraybuffer' });
  }
}

/** Maps HttpClient's upload events to {@link MeshUploadEvent}s (other events are dropped). */
export function uploadEvents(): OperatorFunction<HttpEvent<Mesh>, MeshUploadEvent> {
  return (source) =>
    source.pipe(
      map((event): MeshUploadEvent | null => {
        switch (event.type) {
          case HttpEventType.Sent:
            return { kind: 'uploading', fraction: null };
          case HttpEventType.UploadProgress: {
            if (!event.total) return { kind: 'uploading', fraction: null };
            return event.loaded >= event.total ? { kind: 'checking' } : { kind: 'uploading', fraction: event.loaded / event.total };
          }
          case HttpEventType.Response:
            return event.body ? { kind: 'done', mesh: event.body } : null;
          default:
            return null;
        }
      }),
      filter((e): e is MeshUploadEvent => e !== null),
    );
}
