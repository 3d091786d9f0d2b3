import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { SpinReport } from '@tumblewise/engine';
import { VerdictChip } from '@tumblewise/ui';
import {
  formatFigure,
  inertiaUnitFor,
  showCheck,
  showDirection,
  showInertia,
  showLength,
  showMass,
  showPercent,
  showRate,
  showVolume,
  turnsBeforeFlip,
} from './report-figures';

const ROLES = ['major', 'intermediate', 'minor'] as const;
const CHECK_STATUS: Record<string, string> = {
  pass: 'Within the limit',
  fail: 'Outside the limit',
  info: 'For information',
  'not-evaluated': 'Not evaluated',
};

/**
 * The spin report of a part in display units: the verdict with its margins and explanation, mass and
 * centre of mass, principal moments and axes, trade figures with their axes, the indicative category
 * checks and the report's cautions. Shows a loading line while a newer report is computed.
 */
@Component({
  selector: 'tw-spin-report-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [VerdictChip],
  templateUrl: './spin-report-panel.html',
  styleUrl: './spin-report-panel.scss',
})
export class SpinReportPanel {
  /** The report shown (null: nothing to show yet). */
  readonly report = input<SpinReport | null>(null);
  /** The intended spin rate of the analysed document (rad/s), for the turn count. */
  readonly rate = input<number | null>(null);
  /** Heading of the panel ("Live spin report", "Variant 3 (read-only)"). */
  readonly heading = input('Spin report');
  /** A newer report is being computed. */
  readonly loading = input(false);
  /** The report is out of date because the document has a problem (named here). */
  readonly staleReason = input<string | null>(null);
  /** A failure to show above the report. */
  readonly error = input<string | null>(null);
  /** What to say when there is no report. */
  readonly emptyMessage = input('Add a primitive to see the spin report.');

  protected readonly roles = ROLES;
  protected readonly checkStatus = CHECK_STATUS;
  protected readonly momentUnit = computed(() => inertiaUnitFor(this.report()?.principal.moments ?? []));
  protected readonly tradeUnit = computed(() => {
    const t = this.report()?.trade;
    return inertiaUnitFor(t ? [t.swingweight, t.twistweight, t.recoilWeight, t.pivot?.moment ?? null] : []);
  });
  protected readonly rateShown = computed(() => (this.rate() === null ? null : showRate(this.rate()!)));
  protected readonly turns = computed(() => turnsBeforeFlip(this.report()?.spin.flipTime ?? null, this.rate()));
  protected readonly turnsText = computed(() => {
    const n = this.turns();
    if (n === null) return '';
    const shown = formatFigure(n, 2);
    return `${shown} ${shown === '1' ? 'turn' : 'turns'}`;
  });
  protected readonly mass = computed(() => (this.report() ? showMass(this.report()!.mass) : null));
  protected readonly volume = computed(() => (this.report() ? showVolume(this.report()!.volume) : null));
  protected readonly centre = computed(() => this.report()?.centerOfMass.map((c) => showLength(c).value) ?? []);
  protected readonly moments = computed(() => {
    const r = this.report();
    if (!r) return [];
    return ROLES.map((role, i) => ({
      role,
      moment: showInertia(r.principal.moments[i], this.momentUnit()),
      axis: showDirection(r.principal.axes[i]),
      gyration: showLength(r.trade.radiusOfGyration[role]).value,
    }));
  });
  protected readonly trade = computed(() => {
    const r = this.report();
    if (!r) return null;
    const t = r.trade;
    const unit = this.tradeUnit();
    const pivotMm = t.pivot ? showLength(t.pivot.distance).value : null;
    return [
      {
        id: 'balance',
        name: 'Balance point',
        about: 'Centre of mass, measured from the butt along the long axis',
        shown: showLength(t.balancePoint),
      },
      {
        id: 'swingweight',
        name: 'Swingweight',
        about: 'About the axis 100 mm from the butt, across the long axis in the face plane',
        shown: showInertia(t.swingweight, unit),
      },
      {
        id: 'recoil',
        name: 'Recoil weight',
        about: 'About the parallel axis through the balance point',
        shown: showInertia(t.recoilWeight, unit),
      },
      { id: 'twistweight', name: 'Twistweight', about: 'About the long axis', shown: showInertia(t.twistweight, unit) },
      {
        id: 'pivot',
        name: 'Pivot moment',
        about: pivotMm ? `About the parallel axis through the pivot ${pivotMm} mm from the butt` : 'About a pivot on the long axis',
        shown: showInertia(t.pivot?.moment ?? null, unit),
      },
      {
        id: 'percussion',
        name: 'Centre of percussion',
        about: pivotMm ? `For the pivot ${pivotMm} mm from the butt, measured from the butt` : 'For the pivot, measured from the butt',
        shown: showLength(t.pivot?.centreOfPercussion ?? null),
      },
      { id: 'length', name: 'Overall length', about: 'Along the long axis', shown: showLength(t.length) },
    ];
  });
  protected readonly hasGrip = computed(
    () => this.report()?.trade.balancePoint !== null && this.report()?.trade.balancePoint !== undefined,
  );
  protected readonly checks = computed(() => (this.report()?.checks ?? []).map((c) => ({ check: c, shown: showCheck(c) })));

  /** A relative margin as a percentage. */
  protected percent(x: number): string {
    return showPercent(x);
  }

  /** A plain number for the screen. */
  protected figure(x: number | null, digits = 3): string {
    return formatFigure(x, digits);
  }
}
