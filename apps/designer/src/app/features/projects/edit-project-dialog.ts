import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { ProjectsApi, toApiError } from '@tumblewise/api-client';
import { GEAR_CATEGORIES, updateProjectBodySchema, type GearCategory, type Project } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';
import { CATEGORY_LABELS } from './category-labels';

/** What the dialog needs to know. */
export interface EditProjectDialogData {
  workspaceId: string;
  project: Project;
}

const rules = updateProjectBodySchema.shape;

/** Renames a project or changes its category and notes; closes with the updated project. */
@Component({
  selector: 'tw-edit-project-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatFormField,
    MatLabel,
    MatError,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
  ],
  template: `
    <h2 mat-dialog-title>Edit project</h2>
    <form [formGroup]="form" (ngSubmit)="saveProject()" novalidate>
      <mat-dialog-content>
        <tw-error-banner [message]="failure()" />
        <div class="tw-form">
          <mat-form-field appearance="outline">
            <mat-label>Project name</mat-label>
            <input matInput formControlName="name" data-testid="edit-project-name" />
            <mat-error>{{ form.controls.name | fieldError: 'Project name' }}</mat-error>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>Gear category</mat-label>
            <mat-select formControlName="category" data-testid="edit-project-category">
              @for (category of categories; track category) {
                <mat-option [value]="category">{{ categoryLabels[category] }}</mat-option>
              }
            </mat-select>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>Notes (optional)</mat-label>
            <textarea matInput formControlName="notes" rows="3" data-testid="edit-project-notes"></textarea>
            <mat-error>{{ form.controls.notes | fieldError: 'Notes' }}</mat-error>
          </mat-form-field>
        </div>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" (click)="cancel()">Cancel</button>
        <button mat-flat-button type="submit" [disabled]="submitting()" data-testid="edit-project-save">
          {{ submitting() ? 'Saving…' : 'Save' }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
})
export class EditProjectDialog {
  private readonly data = inject<EditProjectDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<EditProjectDialog, Project>>(MatDialogRef);
  private readonly projectsApi = inject(ProjectsApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly categories = GEAR_CATEGORIES;
  protected readonly categoryLabels = CATEGORY_LABELS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.data.project.name, [Validators.required, zodValidator(rules.name)]],
    category: [this.data.project.category as GearCategory, [Validators.required]],
    notes: [this.data.project.notes, [zodValidator(rules.notes)]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** Saves the changes and closes with the updated project. */
  protected saveProject(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const { name, category, notes } = this.form.getRawValue();
    this.submitting.set(true);
    this.projectsApi.update(this.data.workspaceId, this.data.project.id, { name: name.trim(), category, notes }).subscribe({
      next: (project) => {
        this.submitting.set(false);
        this.dialogRef.close(project);
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (!applyServerError(this.form, fault)) this.failure.set(fault.message);
      },
    });
  }

  /** Closes without saving. */
  protected cancel(): void {
    this.dialogRef.close();
  }
}
