import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatTabLink, MatTabNav, MatTabNavPanel } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive } from '@angular/router';

/** Switches between the platform pages (all workspaces, health); the page goes inside. */
@Component({
  selector: 'tw-operator-tabs',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTabNav, MatTabLink, MatTabNavPanel, RouterLink, RouterLinkActive],
  template: `
    <nav mat-tab-nav-bar [tabPanel]="panel" aria-label="Platform pages">
      <a
        mat-tab-link
        routerLink="/operator/workspaces"
        routerLinkActive
        #workspaces="routerLinkActive"
        [active]="workspaces.isActive"
        data-testid="operator-tab-workspaces"
        >All workspaces</a
      >
      <a
        mat-tab-link
        routerLink="/operator/health"
        routerLinkActive
        #health="routerLinkActive"
        [active]="health.isActive"
        data-testid="operator-tab-health"
        >Platform health</a
      >
    </nav>
    <mat-tab-nav-panel #panel><ng-content /></mat-tab-nav-panel>
  `,
  styles: `
    nav {
      margin-bottom: 16px;
    }
  `,
})
export class OperatorTabs {}
