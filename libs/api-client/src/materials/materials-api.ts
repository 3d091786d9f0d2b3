import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Material } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** The material library and the workspace's own materials (`/workspaces/:id/materials`). */
@Injectable({ providedIn: 'root' })
export class MaterialsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Lists the library materials and the workspace's own, by name. */
  list(workspaceId: string): Observable<Material[]> {
    return this.http.get<Material[]>(`${this.base}/workspaces/${encodeURIComponent(workspaceId)}/materials`);
  }
}
