import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { AbstractControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import {
  MAT_DIALOG_DATA,
  MatDialogActions,
  MatDialogClose,
  MatDialogContent,
  MatDialogRef,
  MatDialogTitle,
} from '@angular/material/dialog';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { MaterialLibraryApi, toApiError } from '@tumblewise/api-client';
import { MATERIAL_FAMILIES, materialBodySchema, type Material, type MaterialBody } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';
import { percentToRelative, relativeToPercent } from '../settings/tolerance-units';

/** What the dialog edits: a workspace id and, for a change, the material. */
export interface MaterialDialogData {
  workspaceId: string;
  material?: Material;
}

const shape = materialBodySchema.shape;

/** The tolerance is typed in percent; the shared rule is on the fraction. */
function tolerancePercentValidator(control: AbstractControl): ValidationErrors | null {
  const raw = control.value as number | string | null;
  if (raw === null || raw === '') return { required: true };
  const result = shape.densityTolerance.safeParse(percentToRelative(Number(raw)));
  return result.success ? null : { rule: 'must be from 0 to 50 %' };
}

/** Adds or changes a workspace material; closes with the saved material. */
@Component({
  selector: 'tw-material-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatDialogClose,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatSuffix,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
  ],
  template: `
    <h2 mat-dialog-title>{{ data.material ? 'Change ' + data.material.name : 'Add a material' }}</h2>
    <form [formGroup]="form" (ngSubmit)="saveMaterial()" novalidate aria-label="Material">
      <mat-dialog-content class="tw-material-fields">
        <tw-error-banner [message]="formError()" />
        <mat-form-field appearance="outline">
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" data-testid="material-name" />
          <mat-error data-testid="material-name-error">{{ form.controls.name | fieldError: 'Name' }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Family</mat-label>
          <mat-select formControlName="family" data-testid="material-family">
            @for (family of families; track family) {
              <mat-option [value]="family">{{ family }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Density</mat-label>
          <input matInput type="number" formControlName="density" min="0" step="1" data-testid="material-density" />
          <span matTextSuffix>kg/m³</span>
          <mat-error data-testid="material-density-error">{{ form.controls.density | fieldError: 'Density' }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Density tolerance ±</mat-label>
          <input matInput type="number" formControlName="tolerancePercent" min="0" max="50" step="0.5" data-testid="material-tolerance" />
          <span matTextSuffix>%</span>
          <mat-error data-testid="material-tolerance-error">{{
            form.controls.tolerancePercent | fieldError: 'Density tolerance'
          }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Source</mat-label>
          <input matInput formControlName="source" data-testid="material-source" />
          <mat-hint>Where the figure comes from: a handbook, a standard, your own measurement, or "common practice".</mat-hint>
          <mat-error data-testid="material-source-error">{{ form.controls.source | fieldError: 'Source' }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="undefined" data-testid="material-cancel">Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()" data-testid="material-save">{{ saving() ? 'Saving…' : 'Save' }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .tw-material-fields {
      display: flex;
      flex-direction: column;
      gap: 4px;
      min-width: min(420px, 80vw);
    }
  `,
})
export class MaterialDialog {
  protected readonly data = inject<MaterialDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<MaterialDialog, Material>>(MatDialogRef);
  private readonly api = inject(MaterialLibraryApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly families = MATERIAL_FAMILIES;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.data.material?.name ?? '', [zodValidator(shape.name)]],
    family: [this.data.material?.family ?? ('wood' as Material['family'])],
    density: [this.data.material?.density ?? (null as unknown as number), [zodValidator(shape.density)]],
    tolerancePercent: [this.data.material ? relativeToPercent(this.data.material.densityTolerance) : 5, [tolerancePercentValidator]],
    source: [this.data.material?.source ?? '', [zodValidator(shape.source)]],
  });
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  /** Saves; a refusal names the field and nothing is saved. */
  protected saveMaterial(): void {
    this.formError.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const value = this.form.getRawValue();
    const body: MaterialBody = {
      name: value.name.trim(),
      family: value.family,
      density: Number(value.density),
      densityTolerance: percentToRelative(Number(value.tolerancePercent)),
      source: value.source.trim(),
    };
    this.saving.set(true);
    const save = this.data.material
      ? this.api.update(this.data.workspaceId, this.data.material.id, body)
      : this.api.create(this.data.workspaceId, body);
    save.subscribe({
      next: (material) => {
        this.saving.set(false);
        this.dialogRef.close(material);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const fault = toApiError(error);
        if (!applyServerError(this.form, fault, { densityTolerance: 'tolerancePercent' })) this.formError.set(fault.message);
      },
    });
  }
}
