import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { ReviewThread } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** The sign-off thread of a variant (`/workspaces/:id/variants/:variantId/review`). */
@Injectable({ providedIn: 'root' })
export class ReviewsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** The variant's sign-off status and its entries in time order. */
  thread(workspaceId: string, variantId: string): Observable<ReviewThread> {
    return this.http.get<ReviewThread>(this.url(workspaceId, variantId));
  }

  /** Asks a member who may decide to sign the variant off (they get an e-mail); 409 when already in review or approved. */
  request(workspaceId: string, variantId: string, body: { reviewerId: string; message?: string }): Observable<ReviewThread> {
    return this.http.post<ReviewThread>(`${this.url(workspaceId, variantId)}/request`, body);
  }

  /** Adds a comment to the thread. */
  comment(workspaceId: string, variantId: string, body: { body: string }): Observable<ReviewThread> {
    return this.http.post<ReviewThread>(`${this.url(workspaceId, variantId)}/comments`, body);
  }

  /** Approves the variant or sends it back; 409 unless it is in review. */
  decide(
    workspaceId: string,
    variantId: string,
    body: { decision: 'approved' | 'changes_requested'; body?: string },
  ): Observable<ReviewThread> {
    return this.http.post<ReviewThread>(`${this.url(workspaceId, variantId)}/decision`, body);
  }

  private url(workspaceId: string, variantId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/variants/${encodeURIComponent(variantId)}/review`;
  }
}
