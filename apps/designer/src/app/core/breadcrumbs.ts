import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';

/** One step of a breadcrumb trail: a link, or (the last one) the page itself. */
export interface Crumb {
  label: string;
  /** Router link; absent for the current page. */
  link?: readonly unknown[] | string;
  /** data-testid of the link, for tests. */
  testId?: string;
}

/**
 * Where a page sits: Projects › project › part › page. Every step but the last is a link; the last
 * is marked as the current page for screen readers.
 */
@Component({
  selector: 'tw-breadcrumbs',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink],
  template: `
    <nav class="tw-crumbs" aria-label="Breadcrumb">
      @for (crumb of trail(); track $index; let last = $last) {
        @if (last || !crumb.link) {
          <span [attr.aria-current]="last ? 'page' : null" [attr.data-testid]="crumb.testId ?? null">{{ crumb.label }}</span>
        } @else {
          <a [routerLink]="crumb.link" [attr.data-testid]="crumb.testId ?? null">{{ crumb.label }}</a>
        }
        @if (!last) {
          <span aria-hidden="true">›</span>
        }
      }
    </nav>
  `,
  styles: `
    .tw-crumbs {
      display: flex;
      flex-wrap: wrap;
      gap: 8px;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class Breadcrumbs {
  readonly trail = input.required<readonly Crumb[]>();
}

/** The trail of a page about one part: Projects › project › part › `page`. */
export function partTrail(
  projectId: string,
  projectName: string | undefined,
  partId: string,
  partName: string | undefined,
  page: string,
): Crumb[] {
  return [
    { label: 'Projects', link: '/', testId: 'crumb-projects' },
    { label: projectName ?? 'Project', link: ['/projects', projectId], testId: 'crumb-project' },
    { label: partName ?? 'Part', link: ['/projects', projectId, 'parts', partId], testId: 'crumb-part' },
    { label: page },
  ];
}
