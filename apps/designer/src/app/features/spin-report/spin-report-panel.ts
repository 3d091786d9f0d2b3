import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { SpinAssessment, SpinReport } from '@tumblewise/engine';
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
  /**
   * The axis the motion circles, where it is not the nearest one. Reports stored before the engine
   * computed it have no motion axis, cone or flight time: those lines are left out.
   */
  protected readonly motion = computed(() => {
    const spin: Partial<SpinAssessment> | undefined = this.report()?.spin;
    const axis = spin?.motionAxis;
    if (!spin || axis === undefined || axis === spin.nearestAxis) return null;
    if (axis === 'separatrix') return '— the motion lies on the separatrix between the major and the minor axis';
    const cone = spin.coneHalfAngleDeg ?? null;
    return `— the motion circles the ${axis} axis${cone === null ? '' : ` (cone half-angle ${formatFigure(cone, 3)}°)`}`;
  });
  /** Time to the first flip, with the e-folding time where the flip grows from the intermediate axis. */
  protected readonly flipDetail = computed(() => {
    const spin = this.report()?.spin;
    if (!spin) return '';
    const eFolding = spin.eFoldingTime;
    return `${formatFigure(spin.flipTime, 3)} s${eFolding === null ? '' : `; a disturbance grows e-fold every ${formatFigure(eFolding, 3)} s`}`;
  });
  /** Time in the air the flip is compared with, and where it comes from. */
  protected readonly flight = computed(() => {
    const spin: Partial<SpinAssessment> | undefined = this.report()?.spin;
    const seconds = spin?.flightTime;
    if (seconds === undefined || seconds === null) return null;
    const basis = spin?.flightTimeSource === 'part' ? 'set for this part' : 'category default, a common practice estimate';
    const flip = spin?.flipTime ?? null;
    const after = flip !== null && flip > seconds ? ': the first flip comes after the flight ends' : '';
    return `In the air about ${formatFigure(seconds, 3)} s (${basis})${after}.`;
  });
  /** The body-frame wobble: its exact period where the report has one, else the frequency older reports carry. */
  protected readonly wobble = computed(() => {
    const spin: Partial<SpinAssessment> | undefined = this.report()?.spin;
    const frequency = spin?.wobbleFrequency ?? null;
    if (!spin || spin.flipTime != null || frequency === null || !(frequency > 0)) return null;
    const period = spin.wobblePeriod ?? null;
    return period !== null
      ? `once every ${formatFigure(period, 3)} s (${formatFigure(1 / period, 3)} Hz)`
      : `${formatFigure(frequency / (2 * Math.PI), 3)} Hz`;
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
