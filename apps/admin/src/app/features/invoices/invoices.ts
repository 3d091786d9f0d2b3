import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { BillingApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { Invoice } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { formatMoney } from '../../core/money';
import { INVOICE_STATUS_LABELS } from './invoice-status';

/** The workspace's invoices: date, number, amount, status and the document. */
@Component({
  selector: 'tw-invoices',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, RouterLink, MatTableModule, PageHeader, EmptyState, ErrorBanner, LoadingState],
  template: `
    <div class="tw-page">
      <tw-page-header heading="Invoices" [subtitle]="workspace.workspace()?.name ?? null" />
      @if (invoices.isLoading() && !invoices.value()) {
        <tw-loading-state label="Loading invoices…" />
      } @else if (loadError(); as message) {
        <tw-error-banner [message]="message" [retryable]="true" (retry)="reloadInvoices()" />
      } @else if (!invoices.value()?.length) {
        <tw-empty-state
          icon="receipt_long"
          heading="No invoices yet"
          message="The first invoice appears here once a subscription is billed."
          data-testid="invoices-empty"
        >
          <a routerLink="/subscription">Go to Subscription</a>
        </tw-empty-state>
      } @else {
        <div class="tw-table-wrap">
          <table mat-table [dataSource]="invoices.value() ?? []" aria-label="Invoices" data-testid="invoices-table">
            <ng-container matColumnDef="date">
              <th mat-header-cell *matHeaderCellDef>Date</th>
              <td mat-cell *matCellDef="let invoice">{{ invoice.createdAt | date: 'mediumDate' }}</td>
            </ng-container>
            <ng-container matColumnDef="number">
              <th mat-header-cell *matHeaderCellDef>Number</th>
              <td mat-cell *matCellDef="let invoice" data-testid="invoice-number">{{ invoice.number ?? '—' }}</td>
            </ng-container>
            <ng-container matColumnDef="description">
              <th mat-header-cell *matHeaderCellDef>For</th>
              <td mat-cell *matCellDef="let invoice">{{ invoice.description }}</td>
            </ng-container>
            <ng-container matColumnDef="amount">
              <th mat-header-cell *matHeaderCellDef class="tw-number">Amount</th>
              <td mat-cell *matCellDef="let invoice" class="tw-number" data-testid="invoice-amount">{{ amount(invoice) }}</td>
            </ng-container>
            <ng-container matColumnDef="status">
              <th mat-header-cell *matHeaderCellDef>Status</th>
              <td mat-cell *matCellDef="let invoice">
                <span
                  class="tw-status"
                  [class]="'tw-status-' + invoice.status"
                  data-testid="invoice-status"
                  [attr.data-status]="invoice.status"
                  >{{ statusLabel(invoice) }}</span
                >
              </td>
            </ng-container>
            <ng-container matColumnDef="document">
              <th mat-header-cell *matHeaderCellDef>Document</th>
              <td mat-cell *matCellDef="let invoice">
                @if (invoice.documentUrl) {
                  <a [href]="invoice.documentUrl" target="_blank" rel="noopener" data-testid="invoice-document">
                    Open<span class="tw-visually-hidden"> invoice {{ invoice.number ?? '' }} (new tab)</span>
                    <span class="material-icons tw-inline-icon" aria-hidden="true">open_in_new</span>
                  </a>
                } @else {
                  —
                }
              </td>
            </ng-container>
            <tr mat-header-row *matHeaderRowDef="columns"></tr>
            <tr mat-row *matRowDef="let invoice; columns: columns" data-testid="invoice-row"></tr>
          </table>
        </div>
      }
    </div>
  `,
  styles: `
    .tw-number {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
    .tw-status {
      display: inline-block;
      padding: 2px 8px;
      border-radius: 10px;
      font: var(--mat-sys-label-medium);
      background: var(--mat-sys-surface-container-high);
      color: var(--mat-sys-on-surface);
    }
    .tw-status-paid {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .tw-status-open,
    .tw-status-uncollectible {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .tw-inline-icon {
      font-size: 16px;
      vertical-align: middle;
      margin-left: 2px;
    }
  `,
})
export class Invoices {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly billingApi = inject(BillingApi);

  protected readonly columns = ['date', 'number', 'description', 'amount', 'status', 'document'];
  protected readonly invoices = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.billingApi.invoices(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.invoices.error();
    return error ? toApiError(error).message : null;
  });

  /** What the invoice is for: the amount paid once paid, else the amount due. */
  protected amount(invoice: Invoice): string {
    return formatMoney(invoice.status === 'paid' ? invoice.amountPaid : invoice.amountDue, invoice.currency);
  }

  /** A status as written on screen. */
  protected statusLabel(invoice: Invoice): string {
    return INVOICE_STATUS_LABELS[invoice.status] ?? invoice.status;
  }

  /** Loads the list again after a failure. */
  protected reloadInvoices(): void {
    this.invoices.reload();
  }
}
