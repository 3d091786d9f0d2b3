import { ChangeDetectionStrategy, Component, effect, input, output, signal, untracked } from '@angular/core';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { FieldErrorPipe } from '@tumblewise/ui';
import type { ChartAxis } from './map-charts';
import { nearestPoint } from './map-cells';

/**
 * The keyboard way to choose a grid point: a value for each swept field (display units, starting
 * at the current design, else the middle of the range), and a button that chooses the grid point
 * nearest to them.
 */
@Component({
  selector: 'tw-point-finder',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButton, MatFormField, MatLabel, MatError, MatSuffix, MatInput, FieldErrorPipe],
  template: `
    <form
      class="tw-finder"
      [formGroup]="form()"
      (ngSubmit)="find()"
      novalidate
      aria-label="Choose a grid point by its values"
      data-testid="point-finder"
    >
      @for (control of form().controls.values.controls; track $index; let k = $index) {
        <mat-form-field appearance="outline" subscriptSizing="dynamic" formArrayName="values">
          <mat-label>{{ axes()[k].title }}</mat-label>
          <input matInput type="number" step="any" [formControlName]="k" [attr.data-testid]="'finder-value-' + k" />
          <span matTextSuffix>{{ axes()[k].unit }}</span>
          <mat-error>{{ control | fieldError: axes()[k].title }}</mat-error>
        </mat-form-field>
      }
      <button mat-stroked-button type="submit" data-testid="finder-go">
        <span class="material-icons" aria-hidden="true">my_location</span> Choose the nearest grid point
      </button>
    </form>
  `,
  styles: `
    .tw-finder {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px 12px;
    }
    mat-form-field {
      flex: 1 1 200px;
      max-width: 280px;
    }
    .material-icons {
      font-size: 20px;
      vertical-align: middle;
    }
  `,
})
export class PointFinder {
  /** The swept fields, in axis order (grid values in display units). */
  readonly axes = input.required<readonly ChartAxis[]>();
  /** The row-major index of the grid point nearest to the typed values. */
  readonly found = output<number>();

  protected readonly form = signal(new FormGroup({ values: new FormArray<FormControl<number | null>>([]) }));

  constructor() {
    effect(() => {
      const axes = this.axes();
      untracked(() =>
        this.form.set(new FormGroup({ values: new FormArray(axes.map((a) => new FormControl(startValue(a), Validators.required))) })),
      );
    });
  }

  /** Chooses the grid point nearest to the typed values. */
  protected find(): void {
    const form = this.form();
    if (form.invalid) {
      form.markAllAsTouched();
      return;
    }
    const typed = form.getRawValue().values.map((v) => v ?? Number.NaN);
    this.found.emit(
      nearestPoint(
        this.axes().map((a) => a.values),
        typed,
      ),
    );
  }
}

/** Where the finder starts for an axis: the current design's value, else the middle of the grid. */
function startValue(axis: ChartAxis): number {
  return axis.current ?? axis.values[Math.floor(axis.values.length / 2)];
}
