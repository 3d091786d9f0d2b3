import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatOption, MatSelect } from '@angular/material/select';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { RouterLink } from '@angular/router';
import type { Variant } from '@tumblewise/shared';
import { StatusChip, VerdictChip, type VerdictName } from '@tumblewise/ui';
import { diffDocuments } from './variant-diff';
import { showFieldValue } from './diff-values';

const CHANGE_LABELS = { added: 'Added', removed: 'Removed', changed: 'Changed', moved: 'Moved' } as const;

/**
 * The saved variants of a part, newest first: open one read-only in the report panel, load one into
 * the editor, see which parameters differ between two, and go to the compare and scatter pages.
 */
@Component({
  selector: 'tw-variant-history',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, RouterLink, MatButton, MatFormField, MatLabel, MatSelect, MatOption, VerdictChip, StatusChip],
  templateUrl: './variant-history.html',
  styleUrl: './variant-history.scss',
})
export class VariantHistory {
  /** The part's variants (any order; shown newest first). */
  readonly variants = input.required<readonly Variant[]>();
  /** Base of the part's pages (`/projects/:projectId/parts/:partId`). */
  readonly partPath = input.required<string>();
  /** Id of the variant open in the report panel. */
  readonly openedId = input<string | null>(null);
  /** Whether "load into editor" is offered (not for reviewers). */
  readonly mayEdit = input(false);
  /** Emitted to show a variant read-only in the report panel (null closes it). */
  readonly opened = output<Variant | null>();
  /** Emitted to start editing from a variant's document. */
  readonly loaded = output<Variant>();

  protected readonly changeLabels = CHANGE_LABELS;
  protected readonly newestFirst = computed(() => [...this.variants()].sort((a, b) => b.number - a.number));
  protected readonly leftId = signal<string | null>(null);
  protected readonly rightId = signal<string | null>(null);
  /** The two variants compared: the chosen ones, else the two newest. */
  protected readonly pair = computed(() => {
    const list = this.newestFirst();
    const left = list.find((v) => v.id === this.leftId()) ?? list[1] ?? null;
    const right = list.find((v) => v.id === this.rightId()) ?? list[0] ?? null;
    return left && right ? { left, right } : null;
  });
  protected readonly diff = computed(() => {
    const pair = this.pair();
    return pair ? diffDocuments(pair.left.document, pair.right.document) : null;
  });
  protected readonly compareIds = computed(() => {
    const pair = this.pair();
    return pair ? `${pair.left.id},${pair.right.id}` : '';
  });

  /** The verdict stored with a variant's report. */
  protected verdictOf(variant: Variant): VerdictName | null {
    const verdict = (variant.report as { spin?: { verdict?: string } } | null)?.spin?.verdict;
    return verdict === 'steady' || verdict === 'watch' || verdict === 'flip-prone' ? verdict : null;
  }

  /** A variant's short name: "v2 · longer throat". */
  protected titleOf(variant: Variant): string {
    return variant.label ? `v${variant.number} · ${variant.label}` : `v${variant.number}`;
  }

  /** A diff value in display units. */
  protected show(path: string, value: unknown): string {
    return showFieldValue(path, value);
  }

  /** Chooses the earlier variant of the diff. */
  protected chooseLeft(id: string): void {
    this.leftId.set(id);
  }

  /** Chooses the later variant of the diff. */
  protected chooseRight(id: string): void {
    this.rightId.set(id);
  }

  /** Shows the variant in the report panel, or closes it when it is already open. */
  protected toggleOpen(variant: Variant): void {
    this.opened.emit(this.openedId() === variant.id ? null : variant);
  }

  /** Starts editing from the variant. */
  protected loadIntoEditor(variant: Variant): void {
    this.loaded.emit(variant);
  }
}
