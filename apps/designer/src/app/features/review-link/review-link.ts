import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatAnchor } from '@angular/material/button';
import { Router, RouterLink } from '@angular/router';
import { PartsApi, toApiError, VariantsApi, WorkspaceContext } from '@tumblewise/api-client';
import { EmptyState, ErrorBanner, LoadingState } from '@tumblewise/ui';
import { catchError, concatMap, defaultIfEmpty, EMPTY, from, map, switchMap, take, throwError, type Observable, of } from 'rxjs';

/** Where a variant lives: its workspace, project and part. */
export interface VariantPlace {
  workspaceId: string;
  projectId: string;
  partId: string;
  variantId: string;
}

/**
 * The target of the review e-mail's link (`/review/:variantId`): finds the variant in the current
 * workspace or another of the user's workspaces, then opens its part editor on the review panel.
 */
@Component({
  selector: 'tw-review-link',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatAnchor, LoadingState, ErrorBanner, EmptyState],
  template: `
    <div class="tw-page">
      @if (notFound()) {
        <tw-empty-state
          icon="search_off"
          heading="This variant is not in your workspaces"
          message="It may have been deleted, or the review was asked for in a workspace you are not a member of. Ask the designer to check the link."
          data-testid="review-link-not-found"
        >
          <a mat-flat-button routerLink="/">Go to projects</a>
        </tw-empty-state>
      } @else if (failure(); as message) {
        <tw-error-banner [message]="message" [retryable]="true" (retry)="find()" />
      } @else {
        <tw-loading-state label="Opening the variant for review…" />
      }
    </div>
  `,
})
export class ReviewLink {
  /** The variant named in the link (route parameter). */
  readonly variantId = input.required<string>();

  private readonly workspace = inject(WorkspaceContext);
  private readonly variantsApi = inject(VariantsApi);
  private readonly partsApi = inject(PartsApi);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);

  protected readonly notFound = signal(false);
  protected readonly failure = signal<string | null>(null);

  constructor() {
    effect(() => {
      this.variantId();
      untracked(() => this.find());
    });
  }

  /** Looks the variant up and goes to its part editor. */
  protected find(): void {
    this.notFound.set(false);
    this.failure.set(null);
    this.locate(this.variantId())
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (place) => {
          if (!place) {
            this.notFound.set(true);
            return;
          }
          if (place.workspaceId !== this.workspace.workspaceId()) this.workspace.select(place.workspaceId);
          void this.router.navigate(['/projects', place.projectId, 'parts', place.partId], {
            queryParams: { variant: place.variantId, panel: 'review' },
            replaceUrl: true,
          });
        },
        error: (error: unknown) => this.failure.set(toApiError(error).message),
      });
  }

  /** Tries the current workspace first, then the user's others; null when none holds the variant. */
  private locate(variantId: string): Observable<VariantPlace | null> {
    const current = this.workspace.workspaceId();
    const ids = this.workspace.memberships().map((m) => m.workspace.id);
    const order = current ? [current, ...ids.filter((id) => id !== current)] : ids;
    return from(order).pipe(
      concatMap((workspaceId) =>
        this.variantsApi.get(workspaceId, variantId).pipe(
          map((variant) => ({ workspaceId, variant })),
          // Another workspace's variant answers 404 (never the row); a malformed id answers 400.
          catchError((error: unknown) => ([400, 404].includes(toApiError(error).status) ? EMPTY : throwError(() => error))),
        ),
      ),
      take(1),
      switchMap(({ workspaceId, variant }) =>
        this.partsApi
          .get(workspaceId, variant.partId)
          .pipe(map((part) => ({ workspaceId, projectId: part.projectId, partId: part.id, variantId: variant.id }))),
      ),
      defaultIfEmpty(null),
      catchError((error: unknown) => (toApiError(error).status === 404 ? of(null) : throwError(() => error))),
    );
  }
}
