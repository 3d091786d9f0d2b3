import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Part } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** What a draft save sends: the version last loaded, and the draft and/or a new name. */
export interface SavePartDraft {
  /** The `draftVersion` of the part as last loaded; a stale one answers 409 `stale_version`. */
  draftVersion: number;
  /** The working part document (any JSON; validated only when analysed or saved as a variant). */
  draft?: unknown;
  /** A new name for the part. */
  name?: string;
}

/** Parts of a project and their autosaved drafts. */
@Injectable({ providedIn: 'root' })
export class PartsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Lists a project's parts with their latest variant's verdict. */
  list(workspaceId: string, projectId: string): Observable<Part[]> {
    return this.http.get<Part[]>(`${this.workspaceUrl(workspaceId)}/projects/${encodeURIComponent(projectId)}/parts`);
  }

  /** Creates a part, optionally with a first draft. */
  create(workspaceId: string, projectId: string, body: { name: string; draft?: unknown }): Observable<Part> {
    return this.http.post<Part>(`${this.workspaceUrl(workspaceId)}/projects/${encodeURIComponent(projectId)}/parts`, body);
  }

  /** Loads one part with its draft. */
  get(workspaceId: string, partId: string): Observable<Part> {
    return this.http.get<Part>(this.partUrl(workspaceId, partId));
  }

  /** Saves the draft or the name; 409 `stale_version` when someone saved since `draftVersion`. */
  saveDraft(workspaceId: string, partId: string, body: SavePartDraft): Observable<Part> {
    return this.http.patch<Part>(this.partUrl(workspaceId, partId), body);
  }

  /** Deletes a part and its variants. */
  remove(workspaceId: string, partId: string): Observable<void> {
    return this.http.delete<void>(this.partUrl(workspaceId, partId));
  }

  private partUrl(workspaceId: string, partId: string): string {
    return `${this.workspaceUrl(workspaceId)}/parts/${encodeURIComponent(partId)}`;
  }

  private workspaceUrl(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}`;
  }
}
