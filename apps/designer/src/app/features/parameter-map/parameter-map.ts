import {
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  ElementRef,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import {
  FormArray,
  FormControl,
  FormGroup,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  Validators,
  type AbstractControl,
  type ValidationErrors,
} from '@angular/forms';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatOptgroup, MatOption } from '@angular/material/core';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSelect } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { DesignApi, PartsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { MAX_SWEEP_POINTS, type DesignFigure, type SweepAnswer } from '@tumblewise/shared';
import {
  applyServerError,
  Confirmation,
  EmptyState,
  ErrorBanner,
  FieldErrorPipe,
  focusFirstInvalid,
  LoadingState,
  PageHeader,
} from '@tumblewise/ui';
import { provideCharts } from '@tumblewise/viewer';
import type { ECharts } from 'echarts/core';
import { NgxEchartsDirective } from 'ngx-echarts';
import type { Subscription } from 'rxjs';
import { Breadcrumbs, partTrail } from '../../core/breadcrumbs';
import { partPage } from '../../core/part-page';
import { siToDisplay } from '../part-editor/display-value';
import { documentIssues } from '../part-editor/document-issues';
import { toDraftDocument } from '../part-editor/draft-document';
import { describeChange, withFieldValues, type FieldValue } from './draft-point';
import { marginChartOptions, verdictMapOptions, type ChartAxis } from './map-charts';
import { cellClass, classShares, nearestPoint, summaryText } from './map-cells';
import { availableFigures, FIGURE_DISPLAY } from './map-figures';
import { MapLegend } from './map-legend';
import { allChoices, choiceName, defaultChoices, parameterChoices, type ParameterChoice } from './parameter-choices';
import { pointDetail, showParameter } from './point-detail';
import { PointDetails } from './point-details';
import { PointFinder } from './point-finder';
import { sweepFaultView } from './sweep-fault';
import {
  DEFAULT_STEPS,
  defaultEnds,
  pointLimitMessage,
  primitiveScale,
  sweepRequest,
  totalPoints,
  type AxisSettings,
} from './sweep-settings';

type AxisGroup = FormGroup<{
  parameter: FormControl<string>;
  from: FormControl<number | null>;
  to: FormControl<number | null>;
  steps: FormControl<number | null>;
}>;

/** A finished sweep and the fields it stepped, in axis order. */
interface MapResult {
  answer: SweepAnswer;
  choices: ParameterChoice[];
}

/** What happened to the last "load into draft". */
type LoadOutcome = { kind: 'loaded'; changes: string[] } | { kind: 'conflict' } | { kind: 'failed'; message: string };

/**
 * The parameter map of a part's draft: one or two of its fields stepped over a range on the
 * server; for one field a line of the steady margin with the verdict of each stretch shaded, for
 * two a map of the verdict at every grid point (the app's own palette and legend), the current
 * design marked. A point chosen on the chart (or by typing its values) shows its figures and can
 * be loaded into the draft, after a confirmation, with the draft's version (a conflict is named).
 */
@Component({
  selector: 'tw-parameter-map',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    Breadcrumbs,
    ReactiveFormsModule,
    RouterLink,
    MatAnchor,
    MatButton,
    MatButtonToggle,
    MatButtonToggleGroup,
    MatFormField,
    MatLabel,
    MatHint,
    MatError,
    MatSuffix,
    MatInput,
    MatSelect,
    MatOption,
    MatOptgroup,
    NgxEchartsDirective,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
    MapLegend,
    PointDetails,
    PointFinder,
  ],
  providers: [provideCharts()],
  templateUrl: './parameter-map.html',
  styleUrl: './parameter-map.scss',
})
export class ParameterMapPage {
  /** Route parameter. */
  readonly projectId = input.required<string>();
  /** Route parameter. */
  readonly partId = input.required<string>();

  private readonly workspace = inject(WorkspaceContext);
  private readonly designApi = inject(DesignApi);
  private readonly partsApi = inject(PartsApi);
  private readonly confirmation = inject(Confirmation);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly destroyRef = inject(DestroyRef);

  protected readonly limitText = MAX_SWEEP_POINTS.toLocaleString('en-GB').replace(/,/g, ' ');
  protected readonly mayEdit = computed(() => this.workspace.can('projects.edit'));
  protected readonly partPath = computed(() => ['/projects', this.projectId(), 'parts', this.partId()]);

  private readonly page = partPage({ projectId: this.projectId, partId: this.partId });
  protected readonly part = this.page.part;
  protected readonly loadError = this.page.loadError;
  protected readonly crumbs = computed(() =>
    partTrail(
      this.projectId(),
      this.page.project.hasValue() ? this.page.project.value().name : undefined,
      this.partId(),
      this.part.hasValue() ? this.part.value().name : undefined,
      'Parameter map',
    ),
  );

  /** The part's saved draft, made safe to read. */
  protected readonly doc = computed(() => (this.part.hasValue() ? toDraftDocument(this.part.value().draft, this.part.value().name) : null));
  /** The fields a map may step, by primitive. */
  protected readonly groups = computed(() => {
    const doc = this.doc();
    return doc ? parameterChoices(doc) : [];
  });
  private readonly choiceByKey = computed(() => new Map(allChoices(this.groups()).map((c) => [c.key, c])));
  /** The first problem of the draft the editor would mark, as a sentence; null for a valid draft. */
  protected readonly draftProblem = computed(() => {
    const doc = this.doc();
    const [path, message] = Object.entries(doc ? documentIssues(doc) : {})[0] ?? [];
    return path === undefined
      ? null
      : `The draft has a problem at ${path || 'the document'}: ${message}. Fix it in the part editor, then map it.`;
  });
  protected readonly secondFigures = computed(() => availableFigures(!!this.doc()?.grip).filter((f) => f !== 'steadyMargin'));
  protected readonly figureDisplay = FIGURE_DISPLAY;

  protected readonly form = this.fb.group({
    dimensions: this.fb.control<1 | 2>(1),
    axes: new FormArray<AxisGroup>([axisGroup(DEFAULT_STEPS.line), axisGroup(DEFAULT_STEPS.grid)]),
    second: this.fb.control<DesignFigure | ''>(''),
  });
  /** The form's value, as a signal. */
  private readonly formValue = signal(this.form.getRawValue());
  protected readonly dimensions = computed(() => this.formValue().dimensions);
  /** The step counts of the axes in use. */
  private readonly steps = computed(() =>
    this.formValue()
      .axes.slice(0, this.dimensions())
      .map((a) => a.steps ?? 0),
  );
  protected readonly total = computed(() => totalPoints(this.steps()));
  protected readonly limitMessage = computed(() => pointLimitMessage(this.steps()));
  protected readonly sameField = computed(() => {
    const [a, b] = this.formValue().axes;
    return this.dimensions() === 2 && !!a.parameter && a.parameter === b.parameter;
  });

  /** A sweep under way: how many points it works out. */
  protected readonly sweeping = signal<number | null>(null);
  protected readonly sweepFailure = signal<string | null>(null);
  /** Whether trying the same sweep again may help (not for a refusal of the settings). */
  protected readonly sweepRetryable = signal(false);
  protected readonly cancelled = signal(false);
  protected readonly result = signal<MapResult | null>(null);
  protected readonly selected = signal<number | null>(null);
  protected readonly saving = signal(false);
  protected readonly outcome = signal<LoadOutcome | null>(null);
  protected readonly loadedChanges = computed(() => {
    const o = this.outcome();
    return o?.kind === 'loaded' ? o.changes : [];
  });
  protected readonly failedMessage = computed(() => {
    const o = this.outcome();
    return o?.kind === 'failed' ? o.message : null;
  });

  /** The swept fields as the charts show them: grid in display units, the draft's value now (it moves when a point is loaded). */
  protected readonly chartAxes = computed<ChartAxis[]>(() => {
    const r = this.result();
    if (!r) return [];
    return r.choices.map((c, k) => {
      const now = this.choiceByKey().get(c.key)?.current ?? null;
      const shown = (si: number) => siToDisplay(si, c.units) ?? Number.NaN;
      return {
        title: choiceName(c),
        unit: c.units.unit,
        values: r.answer.axes[k].values.map(shown),
        current: now === null ? null : shown(now),
      };
    });
  });
  protected readonly shares = computed(() => classShares(this.result()?.answer.points ?? []));
  protected readonly chartOptions = computed(() => {
    const r = this.result();
    const axes = this.chartAxes();
    if (!r || axes.length === 0) return null;
    const summary = summaryText(this.shares());
    const classes = r.answer.points.map(cellClass);
    if (axes.length === 1) {
      const second = r.answer.figures.includes(this.shownSecond() as DesignFigure) ? (this.shownSecond() as DesignFigure) : null;
      return marginChartOptions({
        axis: axes[0],
        classes,
        margins: r.answer.points.map((p) => (typeof p.figures['steadyMargin'] === 'number' ? 100 * p.figures['steadyMargin'] : null)),
        second: second
          ? {
              title: FIGURE_DISPLAY[second].label,
              unit: FIGURE_DISPLAY[second].unit,
              values: r.answer.points.map((p) => {
                const v = p.figures[second];
                return typeof v === 'number' ? FIGURE_DISPLAY[second].convert(v) : null;
              }),
            }
          : null,
        selected: this.selected(),
        summary,
      });
    }
    return verdictMapOptions({ x: axes[0], y: axes[1], classes, selected: this.selected(), summary });
  });
  /** The second figure of the line chart, as chosen when the line was drawn or since. */
  private readonly shownSecond = computed(() => this.formValue().second);
  protected readonly detail = computed(() => {
    const r = this.result();
    const index = this.selected();
    return r && index !== null ? pointDetail(r.answer, r.choices, index) : null;
  });

  private sweep: Subscription | null = null;

  constructor() {
    this.form.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.formValue.set(this.form.getRawValue()));
    this.form.controls.dimensions.valueChanges.pipe(takeUntilDestroyed()).subscribe((d) => this.useDimensions(d));
    this.axisGroups.forEach((group, k) => {
      group.controls.parameter.valueChanges.pipe(takeUntilDestroyed()).subscribe((key) => this.useDefaultEnds(k, key));
      group.controls.from.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => group.controls.to.updateValueAndValidity());
    });
    this.useDimensions(1);
    // The fields arrive with the draft: a field no longer in it is replaced by a default one.
    effect(() => {
      const groups = this.groups();
      untracked(() => {
        const defaults = defaultChoices(groups);
        this.axisGroups.forEach((group, k) => {
          const key = group.controls.parameter.value;
          const fallback = defaults[k] ?? defaults[0];
          if ((!key || !this.choiceByKey().has(key)) && fallback) group.controls.parameter.setValue(fallback.key);
        });
      });
    });
    this.destroyRef.onDestroy(() => this.sweep?.unsubscribe());
  }

  protected get axisGroups(): AxisGroup[] {
    return this.form.controls.axes.controls;
  }

  /** The choice a key names. */
  protected choiceOf(key: string): ParameterChoice | undefined {
    return this.choiceByKey().get(key);
  }

  /** A choice's value in the draft, as the hint under the field shows it. */
  protected figureOf(choice: ParameterChoice): string {
    return showParameter(choice, choice.current);
  }

  /** Steps the chosen fields over their ranges on the server. */
  protected runSweep(): void {
    const workspaceId = this.workspace.workspaceId();
    const doc = this.doc();
    this.sweepFailure.set(null);
    this.cancelled.set(false);
    if (!workspaceId || !doc || this.sweeping() !== null) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    if (this.limitMessage() || this.sameField()) return;
    const axes: AxisSettings[] = this.axisGroups.slice(0, this.dimensions()).map((g) => {
      const v = g.getRawValue();
      return { choice: this.choiceByKey().get(v.parameter)!, from: v.from!, to: v.to!, steps: v.steps! };
    });
    const request = sweepRequest(doc, axes, availableFigures(!!doc.grip));
    this.sweeping.set(this.total());
    this.sweep = this.designApi.sweep(request, workspaceId).subscribe({
      next: (answer) => {
        this.sweeping.set(null);
        this.outcome.set(null);
        this.selected.set(null);
        this.result.set({ answer, choices: axes.map((a) => a.choice) });
      },
      error: (error: unknown) => {
        this.sweeping.set(null);
        const fault = toApiError(error);
        if (fault.status === 400) {
          const view = sweepFaultView(fault);
          const placed = view.control ? applyServerError(this.form, { message: view.message, field: view.control }) : false;
          this.sweepRetryable.set(false);
          this.sweepFailure.set(placed ? 'The map was not built: a setting is marked in the form.' : view.message);
        } else {
          this.sweepRetryable.set(true);
          this.sweepFailure.set(`The map was not built. ${fault.message}`);
        }
      },
    });
  }

  /** Stops the sweep under way (the server stops working it out when the request goes). */
  protected cancelSweep(): void {
    this.sweep?.unsubscribe();
    this.sweep = null;
    this.sweeping.set(null);
    this.cancelled.set(true);
  }

  /** Chooses a grid point by its row-major index. */
  protected selectPoint(index: number): void {
    this.selected.set(index);
    this.outcome.set(null);
  }

  /** Takes the chart instance, so a click anywhere on its grid chooses the nearest grid point. */
  protected attachChart(chart: ECharts): void {
    chart.getZr().on('click', (event: { offsetX: number; offsetY: number }) => {
      const pixel = [event.offsetX, event.offsetY];
      const axes = this.chartAxes();
      if (axes.length === 0 || !chart.containPixel({ gridIndex: 0 }, pixel)) return;
      const at = chart.convertFromPixel({ xAxisIndex: 0, yAxisIndex: 0 }, pixel) as number[];
      this.selectPoint(
        nearestPoint(
          axes.map((a) => a.values),
          axes.length === 1 ? [at[0]] : at,
        ),
      );
    });
  }

  /** Asks, then writes the chosen point's values into the draft and saves it with its version. */
  protected loadIntoDraft(): void {
    const r = this.result();
    const d = this.detail();
    if (!r || !d || d.error || !this.mayEdit() || this.saving()) return;
    const fields: FieldValue[] = r.choices.map((c, k) => ({ primitive: c.primitive, parameter: c.parameter, value: d.values[k] }));
    const changes = r.choices.map((c, k) =>
      describeChange(choiceName(c), c.units, this.choiceByKey().get(c.key)?.current ?? c.current, d.values[k]),
    );
    this.outcome.set(null);
    this.confirmation
      .ask({
        title: 'Load this point into the draft?',
        message: `${changes.join('; ')}. The part's saved draft takes these values; everything else in it stays as it is.`,
        confirmLabel: 'Load into draft',
      })
      .subscribe((yes) => {
        if (yes) this.saveDraft(fields, changes);
      });
  }

  /** Loads the part's draft again (after a conflict or a failed load). */
  protected reload(): void {
    this.outcome.set(null);
    this.page.reload();
  }

  private saveDraft(fields: FieldValue[], changes: string[]): void {
    const workspaceId = this.workspace.workspaceId();
    const doc = this.doc();
    if (!workspaceId || !doc || !this.part.hasValue()) return;
    let draft;
    try {
      draft = withFieldValues(doc, fields);
    } catch (error) {
      this.outcome.set({ kind: 'failed', message: (error as Error).message });
      return;
    }
    this.saving.set(true);
    this.partsApi.saveDraft(workspaceId, this.partId(), { draft, draftVersion: this.part.value().draftVersion }).subscribe({
      next: (saved) => {
        this.saving.set(false);
        this.part.set(saved);
        this.outcome.set({ kind: 'loaded', changes });
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const fault = toApiError(error);
        this.outcome.set(
          fault.status === 409 ? { kind: 'conflict' } : { kind: 'failed', message: `The draft was not changed. ${fault.message}` },
        );
      },
    });
  }

  /** One or two fields: the second field's controls take part only in a map. */
  private useDimensions(d: 1 | 2): void {
    const [first, second] = this.axisGroups;
    const steps = first.controls.steps;
    if (d === 2) {
      second.enable({ emitEvent: false });
      if (steps.value === DEFAULT_STEPS.line) steps.setValue(DEFAULT_STEPS.grid, { emitEvent: false });
    } else {
      second.disable({ emitEvent: false });
      if (steps.value === DEFAULT_STEPS.grid) steps.setValue(DEFAULT_STEPS.line, { emitEvent: false });
    }
    this.formValue.set(this.form.getRawValue());
  }

  /** A newly chosen field starts at ±30 % around the draft's value. */
  private useDefaultEnds(k: number, key: string): void {
    const choice = this.choiceByKey().get(key);
    const doc = this.doc();
    if (!choice || !doc) return;
    this.axisGroups[k].patchValue(defaultEnds(choice, primitiveScale(doc, choice.primitive)));
  }
}

/** The controls of one axis: a field, its ends (display units, `to` above `from`) and the number of steps. */
function axisGroup(steps: number): AxisGroup {
  return new FormGroup({
    parameter: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    from: new FormControl<number | null>(null, [Validators.required]),
    to: new FormControl<number | null>(null, [Validators.required, aboveFrom]),
    steps: new FormControl<number | null>(steps, [Validators.required, Validators.min(2), Validators.max(MAX_SWEEP_POINTS), wholeNumber]),
  });
}

function aboveFrom(control: AbstractControl): ValidationErrors | null {
  const from = (control.parent?.get('from')?.value ?? null) as number | null;
  const to = control.value as number | null;
  return from === null || to === null || to > from ? null : { rule: 'must be greater than From' };
}

function wholeNumber(control: AbstractControl): ValidationErrors | null {
  const v: unknown = control.value;
  return v === null || v === '' || Number.isInteger(v) ? null : { rule: 'must be a whole number' };
}
