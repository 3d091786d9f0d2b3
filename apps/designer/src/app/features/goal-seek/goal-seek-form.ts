import { Injectable, signal } from '@angular/core';
import { FormArray, FormControl, FormGroup, type AbstractControl, type ValidationErrors } from '@angular/forms';
import {
  MAX_DESIGN_TARGETS,
  MAX_FREE_PARAMETERS,
  type DesignFigure,
  type DesignParameter,
  type PartDocument,
  type SolveRequest,
} from '@tumblewise/shared';
import { applyServerError } from '@tumblewise/ui';
import { messageForField } from '../part-editor/document-issues';
import { boundsProblems, freeKey, freeRequest, type ParameterField, type PrimitiveParameters } from './free-parameter-model';
import { leadTapeProblems, leadTapeRequest, type LeadTapeSettings } from './lead-tape-model';
import { FIGURES, needsGrip, startingValue, targetProblem, targetRequest, type TargetKind } from './target-model';

/** What is solved: the designer's own free parameters and targets, or the lead-tape preset. */
export type GoalSeekMode = 'custom' | 'leadTape';

export type FreeGroup = FormGroup<{
  primitive: FormControl<string>;
  parameter: FormControl<DesignParameter>;
  min: FormControl<number | null>;
  max: FormControl<number | null>;
}>;
export type TargetGroup = FormGroup<{
  figure: FormControl<DesignFigure>;
  kind: FormControl<TargetKind>;
  value: FormControl<number | null>;
}>;
type LeadTapeControls = { [K in keyof LeadTapeSettings]: FormControl<number | null> };

/** A request ready to send, with what the page needs to show its answer. */
export interface BuiltRequest {
  request: SolveRequest;
  mode: GoalSeekMode;
  /** Primitives the request adds to the draft (the lead tape). */
  added: string[];
}

/** A problem message as a validation error (the field-error pipe writes it after the field's label). */
const rule = (message: string | undefined): ValidationErrors | null => (message ? { rule: message } : null);

/**
 * The goal seek page's form, shared by its parts (picker, targets, lead-tape preset): the free
 * parameters with their bounds, the targets and the preset's fields, all in display units, and
 * the request built from them in SI. Provided by the page.
 */
@Injectable()
export class GoalSeekForm {
  /** The whole form; `free` and `targets` keep the order of the request's lists. */
  readonly form = new FormGroup({
    mode: new FormControl<GoalSeekMode>('custom', { nonNullable: true }),
    free: new FormArray<FreeGroup>([]),
    targets: new FormArray<TargetGroup>([]),
    leadTape: new FormGroup<LeadTapeControls>({
      maxGrams: this.tapeControl('maxGrams'),
      fromMm: this.tapeControl('fromMm'),
      toMm: this.tapeControl('toMm'),
      swingweight: this.tapeControl('swingweight'),
      balanceMm: this.tapeControl('balanceMm'),
    }),
  });

  /** The mode in a signal, for templates and computeds. */
  readonly mode = signal<GoalSeekMode>('custom');
  /** Keys (freeKey) of the free parameters, in order. */
  readonly freeKeys = signal<readonly string[]>([]);
  /** Number of target rows. */
  readonly targetCount = signal(0);
  /** The draft's primitives and their fields. */
  readonly primitives = signal<readonly PrimitiveParameters[]>([]);
  /** Whether the draft has a grip frame (grip figures need one). */
  readonly hasGrip = signal(false);
  /** The draft's figures now (SI), once analysed. */
  readonly current = signal<Partial<Record<DesignFigure, number | null>>>({});

  /** Most free parameters and targets one solve takes. */
  readonly maxFree = MAX_FREE_PARAMETERS;
  readonly maxTargets = MAX_DESIGN_TARGETS;

  constructor() {
    const tape = this.form.controls.leadTape.controls;
    // Each preset field's rule reads the others: check them all now (they had no parent when made) and again on any change.
    const recheck = () => {
      for (const c of Object.values(tape)) c.updateValueAndValidity({ emitEvent: false });
    };
    recheck();
    this.form.controls.leadTape.valueChanges.subscribe(recheck);
    this.form.controls.mode.valueChanges.subscribe((m) => this.mode.set(m));
  }

  get freeArray(): FormArray<FreeGroup> {
    return this.form.controls.free;
  }

  get targetArray(): FormArray<TargetGroup> {
    return this.form.controls.targets;
  }

  /** Takes a (new) draft: its primitives, grip, and free choices kept only where their field still exists. */
  setDraft(primitives: readonly PrimitiveParameters[], hasGrip: boolean): void {
    this.primitives.set(primitives);
    this.hasGrip.set(hasGrip);
    const keys = new Set(primitives.flatMap((p) => p.fields.map((f) => freeKey(f.primitive, f.parameter))));
    for (let i = this.freeArray.length - 1; i >= 0; i--) {
      const g = this.freeArray.at(i).getRawValue();
      if (!keys.has(freeKey(g.primitive, g.parameter))) this.freeArray.removeAt(i);
    }
    if (!hasGrip)
      for (let i = this.targetArray.length - 1; i >= 0; i--)
        if (needsGrip(this.targetArray.at(i).getRawValue().figure)) this.targetArray.removeAt(i);
    if (this.targetArray.length === 0) this.addTarget();
    this.syncSignals();
  }

  /** The field of a primitive's parameter in the current draft. */
  fieldOf(primitive: string, parameter: string): ParameterField | undefined {
    return this.primitives()
      .find((p) => p.id === primitive)
      ?.fields.find((f) => f.parameter === parameter);
  }

  /** Whether a field is marked free. */
  isFree(field: Pick<ParameterField, 'primitive' | 'parameter'>): boolean {
    return this.freeKeys().includes(freeKey(field.primitive, field.parameter));
  }

  /** The bounds group of a free field, or null. */
  freeGroup(field: Pick<ParameterField, 'primitive' | 'parameter'>): FreeGroup | null {
    const i = this.freeKeys().indexOf(freeKey(field.primitive, field.parameter));
    return i < 0 ? null : this.freeArray.at(i);
  }

  /** Marks a field free with its default bounds, or fixed again. */
  toggleFree(field: ParameterField): void {
    const i = this.freeKeys().indexOf(freeKey(field.primitive, field.parameter));
    if (i >= 0) this.freeArray.removeAt(i);
    else if (this.freeArray.length < this.maxFree) this.freeArray.push(this.freeGroupFor(field));
    this.syncSignals();
  }

  /** Adds a target row: the first figure not yet aimed at (and measurable on this draft), equal to its value now. */
  addTarget(): void {
    if (this.targetArray.length >= this.maxTargets) return;
    const used = new Set(this.targetArray.getRawValue().map((t) => t.figure));
    const figure = FIGURES.find((f) => !used.has(f) && (this.hasGrip() || !needsGrip(f))) ?? 'mass';
    const value = new FormControl<number | null>(startingValue(figure, this.current()[figure]), (c) => this.targetRule(c));
    const group: TargetGroup = new FormGroup({
      figure: new FormControl<DesignFigure>(figure, { nonNullable: true }),
      kind: new FormControl<TargetKind>('equal', { nonNullable: true }),
      value,
    });
    group.controls.figure.valueChanges.subscribe(() => value.updateValueAndValidity({ emitEvent: false }));
    group.controls.kind.valueChanges.subscribe(() => value.updateValueAndValidity({ emitEvent: false }));
    value.updateValueAndValidity();
    this.targetArray.push(group);
    this.syncSignals();
  }

  /** Removes a target row. */
  removeTarget(index: number): void {
    this.targetArray.removeAt(index);
    this.syncSignals();
  }

  /** Fills the preset's empty fields from the draft's figures now (only while the designer has not typed in them). */
  suggestLeadTape(length: number | null): void {
    const tape = this.form.controls.leadTape;
    if (tape.dirty) return;
    const now = this.current();
    const suggestion: LeadTapeSettings = {
      maxGrams: 10,
      fromMm: length ? startingValue('balancePoint', 0.6 * length) : null,
      toMm: length ? startingValue('balancePoint', 0.9 * length) : null,
      swingweight: now.swingweight ? startingValue('swingweight', now.swingweight * 1.05) : null,
      balanceMm: now.balancePoint ? startingValue('balancePoint', now.balancePoint) : null,
    };
    tape.setValue(suggestion);
  }

  /** Whether the part of the form the mode uses is valid (marks its fields touched when not). */
  checkValid(): boolean {
    const parts: AbstractControl[] = this.mode() === 'leadTape' ? [this.form.controls.leadTape] : [this.freeArray, this.targetArray];
    const valid = parts.every((c) => c.valid);
    if (!valid) parts.forEach((c) => c.markAllAsTouched());
    return valid;
  }

  /** Why the custom mode cannot solve yet (null when it can). */
  customProblem(): string | null {
    if (this.freeArray.length === 0) return 'Mark at least one field free (click it in the list of fields).';
    if (this.targetArray.length === 0) return 'Add at least one target.';
    return null;
  }

  /**
   * The request for the mode chosen, in SI: the raw draft (as stored; `part` is its validated form)
   * with the free list and targets, or the lead-tape preset's. A string says why there is none.
   */
  buildRequest(raw: Record<string, unknown>, part: PartDocument): BuiltRequest | string {
    if (this.mode() === 'leadTape') {
      const built = leadTapeRequest(raw, part, this.form.controls.leadTape.getRawValue());
      return built.ok ? { request: built.request, mode: 'leadTape', added: [built.tapeId] } : built.message;
    }
    const problem = this.customProblem();
    if (problem) return problem;
    const free = freeRequest(this.freeArray.getRawValue(), (c) => this.fieldOf(c.primitive, c.parameter));
    const targets = this.targetArray.getRawValue().map((t) => targetRequest(t));
    return { request: { part: raw as SolveRequest['part'], free, targets }, mode: 'custom', added: [] };
  }

  /**
   * Puts a 400's message beside the field of the form it is about (`free[1].max`, `targets[0].value`;
   * in the preset, its tape's mass and position and its two targets). Returns false when no field
   * of the form took it (the page shows it above the form).
   */
  showServerError(fault: { message: string; field?: string }): boolean {
    const m = fault.field ? /^(free|targets)\[(\d+)\](?:\.(\w+))?/.exec(fault.field) : null;
    if (!m) return false;
    const [, list, index, key] = m;
    const message = messageForField(fault.message, fault.field!);
    let path: string;
    if (this.mode() === 'leadTape') {
      if (list === 'free') path = index === '0' ? 'leadTape.maxGrams' : key === 'max' ? 'leadTape.toMm' : 'leadTape.fromMm';
      else path = index === '0' ? 'leadTape.swingweight' : 'leadTape.balanceMm';
    } else if (list === 'free') path = `free.${index}.${key === 'max' ? 'max' : 'min'}`;
    else path = `targets.${index}.${key === 'figure' ? 'figure' : 'value'}`;
    return applyServerError(this.form, { message, field: path });
  }

  private freeGroupFor(field: ParameterField): FreeGroup {
    const min = new FormControl<number | null>(field.defaultMin, (c) => rule(boundsProblems(field, c.value as number | null, null).min));
    const max = new FormControl<number | null>(field.defaultMax, (c) => {
      const lower = (c.parent?.get('min')?.value ?? null) as number | null;
      const problems = boundsProblems(field, lower, c.value as number | null);
      return rule(problems.max);
    });
    min.valueChanges.subscribe(() => max.updateValueAndValidity({ emitEvent: false }));
    const group: FreeGroup = new FormGroup({
      primitive: new FormControl(field.primitive, { nonNullable: true }),
      parameter: new FormControl(field.parameter, { nonNullable: true }),
      min,
      max,
    });
    max.updateValueAndValidity();
    return group;
  }

  private targetRule(c: AbstractControl): ValidationErrors | null {
    const g = c.parent as TargetGroup | null;
    if (!g) return null;
    return rule(
      targetProblem({ figure: g.controls.figure.value, kind: g.controls.kind.value, value: c.value as number | null }) ?? undefined,
    );
  }

  private tapeControl(key: keyof LeadTapeSettings): FormControl<number | null> {
    return new FormControl<number | null>(null, (c) => {
      const g = c.parent as FormGroup<LeadTapeControls> | null;
      return g ? rule(leadTapeProblems(g.getRawValue())[key]) : null;
    });
  }

  private syncSignals(): void {
    this.freeKeys.set(this.freeArray.getRawValue().map((g) => freeKey(g.primitive, g.parameter)));
    this.targetCount.set(this.targetArray.length);
  }
}
