import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { ProjectsApi, toApiError } from '@tumblewise/api-client';
import { createProjectBodySchema, GEAR_CATEGORIES, type GearCategory, type Project } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';
import { CATEGORY_LABELS } from './category-labels';

/** What the dialog needs to know. */
export interface NewProjectDialogData {
  workspaceId: string;
}

const rules = createProjectBodySchema.shape;

/** Creates a project (name and gear category); closes with the new project. */
@Component({
  selector: 'tw-new-project-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
  ],
  templateUrl: './new-project-dialog.html',
})
export class NewProjectDialog {
  private readonly data = inject<NewProjectDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<NewProjectDialog, Project>>(MatDialogRef);
  private readonly projectsApi = inject(ProjectsApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly categories = GEAR_CATEGORIES;
  protected readonly categoryLabels = CATEGORY_LABELS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, zodValidator(rules.name)]],
    category: this.createCategoryControl(),
    notes: ['', [zodValidator(rules.notes)]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** Saves the project and closes the dialog with it. */
  protected createProject(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const { name, category, notes } = this.form.getRawValue();
    this.submitting.set(true);
    this.projectsApi
      .create(this.data.workspaceId, {
        name: name.trim(),
        category: category as GearCategory,
        ...(notes.trim() ? { notes: notes.trim() } : {}),
      })
      .subscribe({
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

  private createCategoryControl() {
    return inject(NonNullableFormBuilder).control<GearCategory | ''>('', [Validators.required, zodValidator(rules.category)]);
  }
}
