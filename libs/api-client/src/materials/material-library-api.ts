import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Material, MaterialBody } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** The material library as the admin app manages it: list, and add, change or delete the workspace's own. */
@Injectable({ providedIn: 'root' })
export class MaterialLibraryApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Library materials and the workspace's own, by name. */
  list(workspaceId: string): Observable<Material[]> {
    return this.http.get<Material[]>(this.url(workspaceId));
  }

  /** Adds a workspace material. */
  create(workspaceId: string, body: MaterialBody): Observable<Material> {
    return this.http.post<Material>(this.url(workspaceId), body);
  }

  /** Changes a workspace material (library rows answer 404). */
  update(workspaceId: string, materialId: string, changes: Partial<MaterialBody>): Observable<Material> {
    return this.http.patch<Material>(`${this.url(workspaceId)}/${encodeURIComponent(materialId)}`, changes);
  }

  /** Deletes a workspace material. */
  remove(workspaceId: string, materialId: string): Observable<void> {
    return this.http.delete<void>(`${this.url(workspaceId)}/${encodeURIComponent(materialId)}`);
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/materials`;
  }
}
