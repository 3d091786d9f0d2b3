import { ChangeDetectionStrategy, Component, computed, effect, ElementRef, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { AbstractControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors, ValidatorFn } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { AuthApi, SettingsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import {
  can,
  DISPLAY_INERTIA_UNITS,
  DISPLAY_LENGTH_UNITS,
  DISPLAY_MASS_UNITS,
  workspaceNameSchema,
  type WorkspaceSettings,
} from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, LoadingState, PageHeader, zodValidator } from '@tumblewise/ui';
import { metresToMillimetres, millimetresToMetres, percentToRelative, relativeToPercent } from './tolerance-units';

/** A number from `min` to `max` inclusive, phrased with its unit. */
function rangeValidator(min: number, max: number, unit: string): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const raw = control.value as number | string | null;
    if (raw === null || raw === '') return { required: true };
    const value = Number(raw);
    if (!Number.isFinite(value)) return { rule: 'must be a number' };
    if (value < min || value > max) return { rule: `must be from ${min} to ${max} ${unit}` };
    return null;
  };
}

/** Server field names → form controls. */
const FIELD_ALIASES: Record<string, string> = {
  'displayUnits.length': 'length',
  'displayUnits.mass': 'mass',
  'displayUnits.inertia': 'inertia',
  'defaultTolerances.density': 'densityPercent',
  'defaultTolerances.size': 'sizeMm',
};

/** The workspace's name, the units new parts are shown in, and the tolerances the scatter study starts from. */
@Component({
  selector: 'tw-workspace-settings',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatSuffix,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    PageHeader,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
  ],
  templateUrl: './workspace-settings.html',
  styleUrl: './workspace-settings.scss',
})
export class WorkspaceSettingsPage {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly settingsApi = inject(SettingsApi);
  private readonly authApi = inject(AuthApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly lengthUnits = DISPLAY_LENGTH_UNITS;
  protected readonly massUnits = DISPLAY_MASS_UNITS;
  protected readonly inertiaUnits = DISPLAY_INERTIA_UNITS;

  protected readonly settings = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.settingsApi.get(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.settings.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly mayManage = computed(() => can(this.workspace.role(), 'settings.manage'));

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [zodValidator(workspaceNameSchema)]],
    length: ['mm' as WorkspaceSettings['displayUnits']['length']],
    mass: ['g' as WorkspaceSettings['displayUnits']['mass']],
    inertia: ['kg·cm²' as WorkspaceSettings['displayUnits']['inertia']],
    densityPercent: [5 as number, [rangeValidator(0, 50, '%')]],
    sizeMm: [0.2 as number, [rangeValidator(0, 10, 'mm')]],
  });
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);

  constructor() {
    effect(() => {
      const settings = this.settings.value();
      if (settings) this.fill(settings);
    });
    effect(() => {
      if (this.mayManage()) this.form.enable();
      else this.form.disable();
    });
  }

  /** Saves all fields at once; a refusal names the field and nothing is saved. */
  protected saveSettings(): void {
    const workspaceId = this.workspace.workspaceId();
    this.formError.set(null);
    this.notice.set(null);
    if (!workspaceId) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.settingsApi
      .update(workspaceId, {
        name: value.name.trim(),
        displayUnits: { length: value.length, mass: value.mass, inertia: value.inertia },
        defaultTolerances: { density: percentToRelative(Number(value.densityPercent)), size: millimetresToMetres(Number(value.sizeMm)) },
      })
      .subscribe({
        next: (saved) => {
          this.saving.set(false);
          this.settings.set(saved);
          this.notice.set('Settings saved.');
          // The workspace name shows in the shell: reload the memberships that carry it.
          if (saved.name !== this.workspace.workspace()?.name) this.authApi.loadMe().subscribe({ error: () => undefined });
        },
        error: (error: unknown) => {
          this.saving.set(false);
          const fault = toApiError(error);
          if (!applyServerError(this.form, fault, FIELD_ALIASES)) this.formError.set(fault.message);
        },
      });
  }

  /** Puts the stored values back into the form. */
  protected revert(): void {
    const settings = this.settings.value();
    if (settings) this.fill(settings);
    this.notice.set(null);
    this.formError.set(null);
  }

  /** Loads the settings again after a failure. */
  protected reloadSettings(): void {
    this.settings.reload();
  }

  private fill(settings: WorkspaceSettings): void {
    this.form.reset({
      name: settings.name,
      length: settings.displayUnits.length,
      mass: settings.displayUnits.mass,
      inertia: settings.displayUnits.inertia,
      densityPercent: relativeToPercent(settings.defaultTolerances.density),
      sizeMm: metresToMillimetres(settings.defaultTolerances.size),
    });
  }
}
