import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, output, signal, untracked } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import type { Material } from '@tumblewise/shared';
import { FieldErrorPipe } from '@tumblewise/ui';
import { Subscription } from 'rxjs';
import { issueAt, type FieldIssues } from './document-issues';
import { MeshPicker } from './mesh-picker';
import { meshReferenceProblem } from './mesh-picker-model';
import type { DraftPrimitive } from './draft-document';
import { SHAPE_FIELDS, shapeLabel, type DimensionField } from './primitive-fields';
import {
  formValueToPrimitive,
  numericControls,
  primitiveToFormValue,
  referencedControls,
  type NumericControl,
  type PrimitiveFormValue,
} from './primitive-form-model';
import { densityDefaultHint, hasSizeTolerance, toleranceToForm, withTolerance } from './tolerance-fields';

/** A change the form made to its primitive, and the form control that made it. */
export interface PrimitiveChange {
  primitive: DraftPrimitive;
  field: string;
}

/** The form controls of the manufacturing tolerance, and the document path each one writes. */
const TOLERANCE_CONTROLS = { toleranceDensity: 'tolerance.density', toleranceSize: 'tolerance.size' } as const;
type ToleranceControl = keyof typeof TOLERANCE_CONTROLS;
const isToleranceControl = (name: string): name is ToleranceControl => name in TOLERANCE_CONTROLS;

/**
 * The form of one primitive in display units (mm, g, °, kg/m³), ending with its manufacturing
 * tolerance (± % density or mass, ± mm on its dimensions: the scatter study's starting values). It is
 * rebuilt from the document when another primitive is selected or `revision` changes (undo, reorder,
 * load); while the designer types it emits each change converted to SI. Problems found by the schema
 * or the server appear at their field.
 */
@Component({
  selector: 'tw-primitive-form',
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
    MatButtonToggleGroup,
    MatButtonToggle,
    FieldErrorPipe,
    MeshPicker,
  ],
  templateUrl: './primitive-form.html',
  styleUrl: './primitive-form.scss',
})
export class PrimitiveForm {
  /** The primitive shown. */
  readonly primitive = input.required<DraftPrimitive>();
  /** Its index in the document (for field paths like `primitives[2].radius`). */
  readonly index = input.required<number>();
  /** Bumped by the editor when the document changed other than through this form. */
  readonly revision = input(0);
  /** Problems by JSON path for the whole document. */
  readonly issues = input<FieldIssues>({});
  /** Materials to pick from. */
  readonly materials = input<readonly Material[]>([]);
  /** Shows the values without letting them change (reviewers). */
  readonly readonly = input(false);
  /** Emitted with the primitive (SI) after each edit. */
  readonly changed = output<PrimitiveChange>();
  /** Emitted when a field loses focus (ends one undo step). */
  readonly editEnded = output();

  protected readonly form = signal(new FormGroup<Record<string, FormControl<string | number | null>>>({}));
  protected readonly numeric = signal<NumericControl[]>([]);
  protected readonly source = signal<string>('density');
  protected readonly shape = computed(() => this.primitive().shape);
  protected readonly shapeName = computed(() => shapeLabel(this.shape()));
  protected readonly dimensionFields = computed<readonly DimensionField[]>(() => SHAPE_FIELDS[this.shape()] ?? []);
  protected readonly isPoint = computed(() => this.shape() === 'point');
  protected readonly isMesh = computed(() => this.shape() === 'mesh');
  protected readonly inlineMesh = computed(() => {
    const p = this.primitive();
    return Array.isArray(p['triangles']) ? (p['triangles'] as unknown[]).length : null;
  });
  protected readonly hasSizeTolerance = computed(() => hasSizeTolerance(this.shape()));
  /** Controls whose field follows a named parameter (shown empty), with the parameter they follow. */
  protected readonly references = computed(() => referencedControls(this.primitive()));
  /** What an empty density (mass) scatter stands for. */
  protected readonly toleranceHint = computed(() => densityDefaultHint(this.primitive(), this.materials()));
  /** The tolerance fields' problems in words (the schema's or the server's). */
  protected readonly toleranceDensityError = computed(
    () => `${this.isPoint() ? 'Mass' : 'Density'} scatter ${this.toleranceIssue('toleranceDensity') ?? ''}`,
  );
  protected readonly toleranceSizeError = computed(() => `Dimension scatter ${this.toleranceIssue('toleranceSize') ?? ''}`);
  /** A problem with the mesh reference (document check or server), for the mesh picker. */
  protected readonly meshProblem = computed(() => {
    return meshReferenceProblem(issueAt(this.issues(), `primitives[${this.index()}].meshId`));
  });
  protected readonly selectedMaterial = computed(() => {
    const id = this.primitive()['materialId'];
    return this.materials().find((m) => m.id === id) ?? null;
  });
  private subscription: Subscription | null = null;
  private builtFor = '';

  constructor() {
    effect(() => {
      const key = `${this.index()}:${this.revision()}:${this.shape()}`;
      const primitive = this.primitive();
      const readonly = this.readonly();
      untracked(() => {
        if (key !== this.builtFor) this.build(primitive, readonly);
        this.builtFor = key;
      });
    });
    // Problems found in the document (or named by the server) show at their control.
    effect(() => {
      const issues = this.issues();
      const form = this.form();
      const index = this.index();
      untracked(() => this.applyIssues(form, issues, index));
    });
    inject(DestroyRef).onDestroy(() => this.subscription?.unsubscribe());
  }

  /** Controls of a dimension field (three for a triple). */
  protected controlsOf(field: DimensionField): NumericControl[] {
    return this.numeric().filter((c) => c.name === field.key || c.name.startsWith(`${field.key}_`));
  }

  /** The placement controls (position, then rotation). */
  protected placementControls(kind: 'position' | 'rotation'): NumericControl[] {
    return this.numeric().filter((c) => c.name.startsWith(`${kind}_`));
  }

  /** Id of a control's input element, unique on the page. */
  protected inputId(name: string): string {
    return `primitive-${name}`;
  }

  /** A material's density scatter in per cent, to one decimal. */
  protected tolerancePercent(material: Material): number {
    return Math.round(material.densityTolerance * 1000) / 10;
  }

  /** Ends the current undo step. */
  protected endEdit(): void {
    this.editEnded.emit();
  }

  private build(primitive: DraftPrimitive, readonly: boolean): void {
    this.subscription?.unsubscribe();
    const value = primitiveToFormValue(primitive);
    const controls: Record<string, FormControl<string | number | null>> = {};
    for (const [name, v] of Object.entries(value))
      controls[name] = new FormControl<string | number | null>({ value: v, disabled: readonly });
    const tolerance = toleranceToForm(primitive);
    controls['toleranceDensity'] = this.toleranceControl('toleranceDensity', tolerance.densityPercent, readonly);
    if (hasSizeTolerance(primitive.shape)) controls['toleranceSize'] = this.toleranceControl('toleranceSize', tolerance.sizeMm, readonly);
    const form = new FormGroup(controls);
    this.numeric.set(numericControls(primitive.shape));
    this.source.set(String(value['source']));
    this.form.set(form);
    const subs: Subscription[] = [];
    for (const [name, control] of Object.entries(controls)) {
      subs.push(control.valueChanges.subscribe(() => this.emitChange(form, name)));
    }
    this.subscription = new Subscription(() => subs.forEach((s) => s.unsubscribe()));
    this.applyIssues(form, this.issues(), this.index());
  }

  /**
   * A tolerance control. A problem named at its path keeps it invalid through a validator, so the
   * control's own checks as the designer types do not clear it before the document is checked again.
   */
  private toleranceControl(name: ToleranceControl, value: number | null, readonly: boolean): FormControl<string | number | null> {
    return new FormControl<string | number | null>({ value, disabled: readonly }, () =>
      this.toleranceIssue(name) ? { rule: true } : null,
    );
  }

  private toleranceIssue(name: ToleranceControl): string | null {
    return issueAt(this.issues(), `primitives[${this.index()}].${TOLERANCE_CONTROLS[name]}`);
  }

  private emitChange(form: FormGroup<Record<string, FormControl<string | number | null>>>, field: string): void {
    const value = form.getRawValue() as PrimitiveFormValue;
    if (isToleranceControl(field)) {
      // Number inputs give a number, or null when empty.
      const tolerance = {
        densityPercent: (value['toleranceDensity'] ?? null) as number | null,
        sizeMm: (value['toleranceSize'] ?? null) as number | null,
      };
      this.changed.emit({ primitive: withTolerance(this.primitive(), tolerance), field: TOLERANCE_CONTROLS[field] });
      return;
    }
    if (field === 'source') this.source.set(String(value['source']));
    this.changed.emit({ primitive: formValueToPrimitive(value, this.primitive()), field });
  }

  private applyIssues(form: FormGroup<Record<string, FormControl<string | number | null>>>, issues: FieldIssues, index: number): void {
    const prefix = `primitives[${index}].`;
    const pathOf: Record<string, string> = {
      id: 'id',
      materialId: 'materialId',
      density: 'density',
      mass: 'mass',
      meshId: 'meshId',
      scale: 'scale',
      mode: 'mode',
      ...TOLERANCE_CONTROLS,
    };
    for (const c of this.numeric()) pathOf[c.name] = c.path;
    for (const [name, control] of Object.entries(form.controls)) {
      const path = pathOf[name];
      const message = path ? issueAt(issues, prefix + path) : null;
      if (message) {
        control.setErrors({ rule: message });
        control.markAsTouched();
      } else if (control.errors?.['rule']) {
        control.setErrors(null);
      }
    }
  }
}
