import { PercentPipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  ElementRef,
  inject,
  InjectionToken,
  input,
  signal,
  untracked,
} from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { MaterialsApi, ScatterApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { ScatterResult, Sensitivity } from '@tumblewise/engine';
import type { PartDocument, ScatterStudy as Study } from '@tumblewise/shared';
import {
  applyServerError,
  EmptyState,
  ErrorBanner,
  FieldErrorPipe,
  focusFirstInvalid,
  LoadingState,
  PageHeader,
  VerdictChip,
} from '@tumblewise/ui';
import { provideCharts, SERIES_COLOURS, VIEWER_COLOURS } from '@tumblewise/viewer';
import { NgxEchartsDirective } from 'ngx-echarts';
import { defer, repeat, takeWhile, type Subscription } from 'rxjs';
import { Breadcrumbs, partTrail } from '../../core/breadcrumbs';
import { partPage, variantLabel } from '../../core/part-page';
import { histogramOptions } from './scatter-charts';
import { percentagePoints, studyFigure } from './scatter-figures';
import { defaultTolerances, SAMPLE_LIMITS, TOLERANCE_LIMITS, tolerancesBody, type ToleranceRow } from './scatter-tolerances';

/** How long to wait between two looks at a running study (ms). */
export const SCATTER_POLL_MS = new InjectionToken<number>('SCATTER_POLL_MS', { providedIn: 'root', factory: () => 1000 });

const FINISHED = new Set<Study['state']>(['done', 'failed', 'cancelled']);
const STATE_WORDS: Record<Study['state'], string> = {
  queued: 'Waiting for a worker',
  running: 'Running',
  done: 'Done',
  failed: 'Failed',
  cancelled: 'Cancelled',
};
/** Sensitivity rows shown (the ranking's head). */
const RANKING_ROWS = 8;

/** A parameter name of the engine as the screen writes it (`size[0]` → "size x"). */
export function parameterLabel(name: string): string {
  const m = /^(\w+)\[(\d)\]$/.exec(name);
  if (m) return `${m[1] === 'semiAxes' ? 'semi-axis' : m[1]} ${['x', 'y', 'z'][Number(m[2])] ?? m[2]}`;
  const words: Record<string, string> = {
    innerRadius: 'inner radius',
    topRadius: 'top radius',
    majorRadius: 'major radius',
    minorRadius: 'minor radius',
    wall: 'wall thickness',
  };
  return words[name] ?? name;
}

/** The result of a finished study, when its shape is the engine's (a defensive look at untyped JSON). */
export function scatterResultOf(study: Study | null): ScatterResult | null {
  const r = study?.state === 'done' ? (study.result as Partial<ScatterResult> | null) : null;
  return r && typeof r === 'object' && r.distributions && r.nominal && Array.isArray(r.sensitivities) ? (r as ScatterResult) : null;
}

type ToleranceGroup = FormGroup<{ densityPercent: FormControl<number | null>; sizeMm: FormControl<number | null> }>;

/**
 * The scatter study of a variant: tolerances per primitive (density ± %, dimensions ± mm, defaults
 * from the document and the material library), the sample count, then a background job followed
 * with a progress bar and a cancel button; the result shows a histogram of each margin, how often
 * the verdict changes, and which tolerance moves the margins most ("what to change first").
 */
@Component({
  selector: 'tw-scatter-study',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    Breadcrumbs,
    ReactiveFormsModule,
    PercentPipe,
    RouterLink,
    MatAnchor,
    MatButton,
    MatFormField,
    MatLabel,
    MatHint,
    MatError,
    MatSuffix,
    MatInput,
    MatProgressBar,
    NgxEchartsDirective,
    PageHeader,
    VerdictChip,
    EmptyState,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
  ],
  providers: [provideCharts()],
  templateUrl: './scatter-study.html',
  styleUrl: './scatter-study.scss',
})
export class ScatterStudyPage {
  /** Route parameter. */
  readonly projectId = input.required<string>();
  /** Route parameter. */
  readonly partId = input.required<string>();
  /** Query parameter: the variant to study; the newest when absent. */
  readonly variant = input<string | undefined>();

  protected readonly workspace = inject(WorkspaceContext);
  private readonly materialsApi = inject(MaterialsApi);
  private readonly scatterApi = inject(ScatterApi);
  private readonly pollMs = inject(SCATTER_POLL_MS);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly limits = TOLERANCE_LIMITS;
  protected readonly sampleLimits = SAMPLE_LIMITS;
  protected readonly stateWords = STATE_WORDS;
  protected readonly parameterLabel = parameterLabel;
  protected readonly Math = Math;
  protected readonly figure = studyFigure;
  protected readonly points = percentagePoints;
  protected readonly mayRun = computed(() => this.workspace.can('projects.edit'));

  /** The part, its variants and the studied one (of `?variant=`, else the newest). */
  private readonly page = partPage({ projectId: this.projectId, partId: this.partId, variant: this.variant });
  protected readonly part = this.page.part;
  protected readonly crumbs = computed(() =>
    partTrail(this.projectId(), this.page.project.value()?.name, this.partId(), this.part.value()?.name, 'Scatter study'),
  );
  protected readonly chosen = this.page.chosen;
  protected readonly variantLabel = variantLabel;
  private readonly materials = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params }) => this.materialsApi.list(params),
  });

  protected readonly loadError = computed(() => {
    const error = this.materials.error();
    return this.page.loadError() ?? (error ? toApiError(error).message : null);
  });
  protected readonly ready = computed(() => this.page.variants.hasValue() && this.materials.hasValue());
  protected readonly rows = computed<ToleranceRow[]>(() => {
    const v = this.chosen();
    if (!v || !this.materials.hasValue()) return [];
    const doc = v.document as PartDocument | null;
    return defaultTolerances(Array.isArray(doc?.primitives) ? doc.primitives : [], this.materials.value());
  });

  protected readonly form = this.fb.group({
    tolerances: new FormArray<ToleranceGroup>([]),
    samples: this.fb.control<number | null>(SAMPLE_LIMITS.default, [
      Validators.required,
      Validators.min(SAMPLE_LIMITS.min),
      Validators.max(SAMPLE_LIMITS.max),
      wholeNumber,
    ]),
    seed: this.fb.control<number | null>(null, [Validators.min(0), Validators.max(2 ** 31 - 1), wholeNumber]),
  });

  protected readonly study = signal<Study | null>(null);
  protected readonly starting = signal(false);
  protected readonly cancelling = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly running = computed(() => {
    const s = this.study();
    return !!s && !FINISHED.has(s.state);
  });
  protected readonly result = computed(() => scatterResultOf(this.study()));
  protected readonly ranking = computed<Sensitivity[]>(() => this.result()?.sensitivities.slice(0, RANKING_ROWS) ?? []);
  protected readonly firstLever = computed(() => this.ranking()[0] ?? null);
  protected readonly histograms = computed(() => {
    const r = this.result();
    if (!r) return [];
    const margin = (si: number) => si * 100;
    const items = [
      {
        key: 'marginMajor',
        title: 'Margin (I1−I2)/I2',
        unit: '%',
        convert: margin,
        nominal: r.nominal.margins.major,
        colour: VIEWER_COLOURS.major,
      },
      {
        key: 'marginMinor',
        title: 'Margin (I2−I3)/I2',
        unit: '%',
        convert: margin,
        nominal: r.nominal.margins.minor,
        colour: VIEWER_COLOURS.minor,
      },
      { key: 'mass', title: 'Mass', unit: 'g', convert: (si: number) => si * 1000, nominal: null, colour: SERIES_COLOURS[0] },
    ];
    return items
      .filter((h) => r.distributions[h.key])
      .map((h) => ({
        ...h,
        distribution: r.distributions[h.key],
        options: histogramOptions(r.distributions[h.key], h, h.nominal, h.colour),
      }));
  });

  private poller: Subscription | null = null;

  constructor() {
    // A new variant (or the materials arriving) resets the form to its defaults.
    effect(() => {
      const rows = this.rows();
      untracked(() => this.resetTolerances(rows));
    });
    inject(DestroyRef).onDestroy(() => this.poller?.unsubscribe());
  }

  protected get toleranceGroups(): ToleranceGroup[] {
    return this.form.controls.tolerances.controls;
  }

  /** Queues the study and follows it. */
  protected startStudy(): void {
    const workspaceId = this.workspace.workspaceId();
    const variant = this.chosen();
    this.failure.set(null);
    if (!workspaceId || !variant || this.running() || this.starting()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const rows = this.rows().map((r, i) => {
      const g = this.toleranceGroups[i].getRawValue();
      return { primitiveId: r.primitiveId, densityPercent: g.densityPercent ?? 0, sizeMm: r.sizeMm === null ? null : (g.sizeMm ?? 0) };
    });
    const { samples, seed } = this.form.getRawValue();
    this.starting.set(true);
    this.scatterApi
      .start(workspaceId, {
        variantId: variant.id,
        tolerances: tolerancesBody(rows),
        samples: samples!,
        ...(seed !== null ? { seed } : {}),
      })
      .subscribe({
        next: (study) => {
          this.starting.set(false);
          this.study.set(study);
          if (!FINISHED.has(study.state)) this.follow(workspaceId, study.id);
        },
        error: (error: unknown) => {
          this.starting.set(false);
          const fault = toApiError(error);
          if (!applyServerError(this.form, fault, this.fieldAliases())) this.failure.set(fault.message);
        },
      });
  }

  /** Stops the running study. */
  protected cancelStudy(): void {
    const workspaceId = this.workspace.workspaceId();
    const study = this.study();
    if (!workspaceId || !study || this.cancelling()) return;
    this.cancelling.set(true);
    this.scatterApi.cancel(workspaceId, study.id).subscribe({
      next: (cancelled) => {
        this.cancelling.set(false);
        this.poller?.unsubscribe();
        this.study.set(cancelled);
      },
      error: (error: unknown) => {
        this.cancelling.set(false);
        // 409: it finished meanwhile; the next look shows how.
        this.failure.set(toApiError(error).message);
      },
    });
  }

  /** Puts every tolerance back to its default. */
  protected restoreDefaults(): void {
    this.resetTolerances(this.rows());
  }

  /** Loads the data again after a failure. */
  protected reload(): void {
    this.page.reload();
    this.materials.reload();
  }

  private follow(workspaceId: string, studyId: string): void {
    this.poller?.unsubscribe();
    this.poller = defer(() => this.scatterApi.get(workspaceId, studyId))
      .pipe(
        repeat({ delay: this.pollMs }),
        takeWhile((s) => !FINISHED.has(s.state), true),
      )
      .subscribe({
        next: (s) => this.study.set(s),
        error: (error: unknown) => this.failure.set(`Lost track of the study: ${toApiError(error).message}`),
      });
  }

  private resetTolerances(rows: ToleranceRow[]): void {
    const array = this.form.controls.tolerances;
    array.clear();
    for (const r of rows) {
      array.push(
        new FormGroup({
          densityPercent: new FormControl<number | null>(r.densityPercent, [
            Validators.required,
            Validators.min(0),
            Validators.max(TOLERANCE_LIMITS.densityPercent),
          ]),
          sizeMm: new FormControl<number | null>({ value: r.sizeMm, disabled: r.sizeMm === null }, [
            Validators.required,
            Validators.min(0),
            Validators.max(TOLERANCE_LIMITS.sizeMm),
          ]),
        }),
      );
    }
  }

  /** Server fields (`tolerances.<primitiveId>`) mapped to the form's controls. */
  private fieldAliases(): Record<string, string> {
    const aliases: Record<string, string> = {};
    this.rows().forEach((r, i) => {
      aliases[`tolerances.${r.primitiveId}`] = `tolerances.${i}.densityPercent`;
      aliases[`tolerances.${r.primitiveId}.density`] = `tolerances.${i}.densityPercent`;
      aliases[`tolerances.${r.primitiveId}.size`] = `tolerances.${i}.sizeMm`;
    });
    return aliases;
  }
}

function wholeNumber(control: { value: unknown }): { rule: string } | null {
  const v = control.value;
  return v === null || v === '' || Number.isInteger(v) ? null : { rule: 'must be a whole number' };
}
