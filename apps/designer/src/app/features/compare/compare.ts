import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { MatOption, MatSelect } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { API_BASE_URL, FileDownloads, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { buildComparison, type Comparison } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader, StatusChip } from '@tumblewise/ui';
import { provideCharts } from '@tumblewise/viewer';
import { NgxEchartsDirective } from 'ngx-echarts';
import { Breadcrumbs, partTrail } from '../../core/breadcrumbs';
import { partPage, variantLabel } from '../../core/part-page';
import { chartableRows, compareChartOptions, type ChartFigure } from './compare-chart';
import { formatDelta, formatValue } from './compare-figures';

/** Fewest and most variants compared at once. */
export const COMPARE_LIMITS = { min: 2, max: 6 } as const;

/**
 * Compare 2–6 variants of a part side by side: the shared comparison table with deltas against a
 * chosen baseline, a bar chart of one figure or of the principal moments, and the CSV export. The
 * choice lives in the address (`?variants=a,b&baseline=a`) so it can be shared.
 */
@Component({
  selector: 'tw-compare',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    Breadcrumbs,
    RouterLink,
    MatAnchor,
    MatButton,
    MatCheckbox,
    MatRadioGroup,
    MatRadioButton,
    MatFormField,
    MatLabel,
    MatSelect,
    MatOption,
    NgxEchartsDirective,
    PageHeader,
    StatusChip,
    EmptyState,
    ErrorBanner,
    LoadingState,
  ],
  providers: [provideCharts()],
  templateUrl: './compare.html',
  styleUrl: './compare.scss',
})
export class Compare {
  /** Route parameter. */
  readonly projectId = input.required<string>();
  /** Route parameter. */
  readonly partId = input.required<string>();
  /** Query parameter: the compared variant ids, comma-separated. */
  readonly variants = input<string | undefined>();
  /** Query parameter: the baseline's id. */
  readonly baseline = input<string | undefined>();

  protected readonly workspace = inject(WorkspaceContext);
  private readonly downloads = inject(FileDownloads);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly apiBase = inject(API_BASE_URL);

  protected readonly limits = COMPARE_LIMITS;
  protected readonly formatValue = formatValue;
  protected readonly formatDelta = formatDelta;
  protected readonly variantLabel = variantLabel;

  /** The part and its variants (the compared ones live in `?variants=`, not `?variant=`). */
  private readonly page = partPage({ projectId: this.projectId, partId: this.partId });
  protected readonly part = this.page.part;
  protected readonly crumbs = computed(() =>
    partTrail(this.projectId(), this.page.project.value()?.name, this.partId(), this.part.value()?.name, 'Compare variants'),
  );
  protected readonly allVariants = this.page.variants;
  protected readonly loadError = this.page.loadError;
  protected readonly list = this.page.list;

  /** The chosen ids, in the order of the part's variants: from the address, else the newest two. */
  protected readonly selectedIds = linkedSignal<string[]>(() => {
    const all = this.list();
    const asked = (this.variants() ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
    const known = all.filter((v) => asked.includes(v.id)).map((v) => v.id);
    if (asked.length) return known.slice(0, COMPARE_LIMITS.max);
    return all.slice(-2).map((v) => v.id);
  });
  /** Ids in the address that name no variant of this part. */
  protected readonly unknownIds = computed(() => {
    const all = new Set(this.list().map((v) => v.id));
    return this.allVariants.hasValue()
      ? (this.variants() ?? '')
          .split(',')
          .map((s) => s.trim())
          .filter((id) => id && !all.has(id))
      : [];
  });
  protected readonly baselineId = linkedSignal<string | null>(() => {
    const ids = this.selectedIds();
    const asked = this.baseline();
    return asked && ids.includes(asked) ? asked : (ids[0] ?? null);
  });
  protected readonly selected = computed(() => {
    const ids = new Set(this.selectedIds());
    return this.list().filter((v) => ids.has(v.id));
  });
  protected readonly comparison = computed<Comparison | null>(() => {
    const chosen = this.selected();
    if (chosen.length < COMPARE_LIMITS.min || chosen.length > COMPARE_LIMITS.max) return null;
    return buildComparison(
      chosen.map((v) => ({ id: v.id, label: variantLabel(v), report: v.report })),
      this.baselineId() ?? undefined,
    );
  });

  protected readonly figure = signal<ChartFigure>('moments');
  protected readonly figures = computed(() => {
    const c = this.comparison();
    return [{ key: 'moments', label: 'Principal moments I1, I2, I3' }, ...(c ? chartableRows(c) : [])];
  });
  protected readonly chartOptions = computed(() => {
    const c = this.comparison();
    if (!c) return null;
    const figure = this.figures().some((f) => f.key === this.figure()) ? this.figure() : 'moments';
    return compareChartOptions(c, figure);
  });

  protected readonly downloading = signal(false);
  protected readonly downloadError = signal<string | null>(null);

  /** Adds or removes a variant from the comparison (at most six). */
  protected toggleVariant(id: string, checked: boolean): void {
    const current = this.selectedIds();
    if (checked && (current.includes(id) || current.length >= COMPARE_LIMITS.max)) return;
    const next = checked ? [...current, id] : current.filter((x) => x !== id);
    const order = this.list().map((v) => v.id);
    this.selectedIds.set(order.filter((x) => next.includes(x)));
    if (!next.includes(this.baselineId() ?? '')) this.baselineId.set(this.selectedIds()[0] ?? null);
    this.writeAddress();
  }

  /** Makes `id` the baseline the deltas are taken against. */
  protected chooseBaseline(id: string): void {
    if (!this.selectedIds().includes(id)) return;
    this.baselineId.set(id);
    this.writeAddress();
  }

  /** Picks the chart's figure. */
  protected chooseFigure(key: string): void {
    this.figure.set(key);
  }

  /** Downloads the comparison as CSV from the server (the same table, SI units). */
  protected async downloadCsv(): Promise<void> {
    const c = this.comparison();
    const workspaceId = this.workspace.workspaceId();
    if (!c || !workspaceId) return;
    this.downloadError.set(null);
    this.downloading.set(true);
    const query = new URLSearchParams({ variants: c.variants.map((v) => v.id).join(','), baseline: c.variants[c.baselineIndex].id });
    const name = `${this.part.hasValue() ? this.part.value().name : 'part'} comparison`.replace(/[^A-Za-z0-9._-]+/g, '-');
    try {
      await this.downloads.downloadFile(
        `${this.apiBase}/workspaces/${encodeURIComponent(workspaceId)}/compare.csv?${query.toString().replace(/%2C/g, ',')}`,
        `${name}.csv`,
      );
    } catch (error) {
      this.downloadError.set(`The CSV could not be downloaded: ${toApiError(error).message}`);
    } finally {
      this.downloading.set(false);
    }
  }

  /** Downloads one variant's spin report as a PDF (made on the server). */
  protected async downloadPdf(variantId: string, label: string): Promise<void> {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.downloadError.set(null);
    this.downloading.set(true);
    const name = `${this.part.hasValue() ? this.part.value().name : 'part'} ${label} spin report`.replace(/[^A-Za-z0-9._-]+/g, '-');
    try {
      await this.downloads.downloadFile(
        `${this.apiBase}/workspaces/${encodeURIComponent(workspaceId)}/variants/${encodeURIComponent(variantId)}/export.pdf`,
        `${name}.pdf`,
      );
    } catch (error) {
      this.downloadError.set(`The PDF could not be downloaded: ${toApiError(error).message}`);
    } finally {
      this.downloading.set(false);
    }
  }

  /** Loads the variants again after a failure. */
  protected reload(): void {
    this.page.reload();
  }

  protected isSelected(id: string): boolean {
    return this.selectedIds().includes(id);
  }

  private writeAddress(): void {
    const ids = this.selectedIds();
    void this.router.navigate([], {
      relativeTo: this.route,
      queryParams: { variants: ids.length ? ids.join(',') : null, baseline: this.baselineId() },
      queryParamsHandling: 'merge',
      replaceUrl: true,
    });
  }
}
