import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';
import { EmptyState } from '../empty-state/empty-state';

/** The page for an address this app does not know. */
@Component({
  selector: 'tw-not-found',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [EmptyState, RouterLink],
  template: `
    <div class="tw-page" data-testid="not-found">
      <h1 class="tw-visually-hidden">Page not found</h1>
      <tw-empty-state icon="explore_off" heading="There is nothing at this address" message="The link may be old or mistyped.">
        <a routerLink="/">Go to the start page</a>
      </tw-empty-state>
    </div>
  `,
})
export class NotFound {}
