import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { WorkspaceSettings } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** What a settings change may send; every part is optional. */
export interface UpdateWorkspaceSettings {
  name?: string;
  displayUnits?: WorkspaceSettings['displayUnits'];
  defaultTolerances?: WorkspaceSettings['defaultTolerances'];
}

/** The workspace's name, default display units and default tolerances (`/workspaces/:id/settings`). */
@Injectable({ providedIn: 'root' })
export class SettingsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Loads the settings. */
  get(workspaceId: string): Observable<WorkspaceSettings> {
    return this.http.get<WorkspaceSettings>(this.url(workspaceId));
  }

  /** Saves a change; the answer is the whole settings as stored. */
  update(workspaceId: string, changes: UpdateWorkspaceSettings): Observable<WorkspaceSettings> {
    return this.http.patch<WorkspaceSettings>(this.url(workspaceId), changes);
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/settings`;
  }
}
