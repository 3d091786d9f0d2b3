import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Variant } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** What saving a new variant sends. */
export interface CreateVariant {
  /** Short name of the variant ("longer throat"). */
  label?: string;
  /** Free notes. */
  notes?: string;
  /** The part document; the server analyses it and refuses it (400 naming the field, 422) before saving. */
  document: unknown;
}

/** Saved variants of a part: frozen documents with their spin reports. */
@Injectable({ providedIn: 'root' })
export class VariantsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Lists a part's variants, oldest first. */
  list(workspaceId: string, partId: string): Observable<Variant[]> {
    return this.http.get<Variant[]>(`${this.workspaceUrl(workspaceId)}/parts/${encodeURIComponent(partId)}/variants`);
  }

  /** Saves a document as the part's next variant; the answer carries its spin report. */
  create(workspaceId: string, partId: string, body: CreateVariant): Observable<Variant> {
    return this.http.post<Variant>(`${this.workspaceUrl(workspaceId)}/parts/${encodeURIComponent(partId)}/variants`, body);
  }

  /** Loads one variant. */
  get(workspaceId: string, variantId: string): Observable<Variant> {
    return this.http.get<Variant>(`${this.workspaceUrl(workspaceId)}/variants/${encodeURIComponent(variantId)}`);
  }

  /** Changes a variant's label or notes; 409 when `version` is stale. */
  update(workspaceId: string, variantId: string, body: { label?: string; notes?: string; version: number }): Observable<Variant> {
    return this.http.patch<Variant>(`${this.workspaceUrl(workspaceId)}/variants/${encodeURIComponent(variantId)}`, body);
  }

  private workspaceUrl(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}`;
  }
}
