import {
  afterNextRender,
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  ElementRef,
  inject,
  InjectionToken,
  input,
  isDevMode,
  linkedSignal,
  output,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSlider, MatSliderThumb } from '@angular/material/slider';
import { SimulationApi, toApiError } from '@tumblewise/api-client';
import type { SimulationResult, SpinReport } from '@tumblewise/engine';
import type { PartDocument } from '@tumblewise/shared';
import { Cautions, ErrorBanner, LoadingState } from '@tumblewise/ui';
import { NgxEchartsDirective } from 'ngx-echarts';
import { Group, Quaternion } from 'three';
import { finalize, of, switchMap, timer } from 'rxjs';
import { provideCharts } from '../charts/provide-charts';
import { axisRod } from '../scene/axis-rod';
import { disposeObject } from '../scene/dispose-object';
import { MeshGeometryCache } from '../scene/mesh-geometry';
import { MESH_GEOMETRY_SOURCE } from '../scene/mesh-geometry-source';
import { buildPartScene, type PartScene, type UploadedMeshStatus } from '../scene/part-scene';
import { PrimitiveGeometryCache } from '../scene/primitive-geometry-cache';
import { buildPolhodeScene, type PolhodeScene } from '../scene/polhode-scene';
import { AXIS_LABELS, AXIS_ROLES, VIEWER_COLOURS } from '../scene/viewer-palette';
import { ViewerStage, type ViewName } from '../scene/viewer-stage';
import { attitudeAt, trackDuration, vectorAt } from '../tumble/attitude-track';
import { omegaChartOptions } from '../tumble/omega-chart';
import { tumbleRequest } from '../tumble/tumble-request';
import { tumbleSummary } from '../tumble/tumble-summary';

/** Playback speeds offered (simulated seconds per wall-clock second). */
export const TUMBLE_SPEEDS = [0.1, 0.25, 0.5, 1] as const;
/** Range of the misalignment control (degrees). */
export const MISALIGNMENT_RANGE = { min: 0.1, max: 20 } as const;

/**
 * Pause in the edits before asking for a new motion (ms). A motion is thousands of samples and
 * redraws both pictures, so it waits until the designer has stopped typing (keys within a number
 * come 150–300 ms apart) rather than recomputing between two digits; the spin report itself
 * follows every keystroke.
 */
export const TUMBLE_REQUEST_DELAY_MS = new InjectionToken<number>('TUMBLE_REQUEST_DELAY_MS', { providedIn: 'root', factory: () => 600 });

/** How often the time read-out and slider follow the animation (ms); the pictures move every frame. */
const READOUT_INTERVAL_MS = 100;

/**
 * The part in 3-D with its principal axes and intended spin axis, and the tumble preview: the
 * torque-free motion from `POST /simulate` played back with the fixed angular-momentum vector, the
 * polhode on the angular-momentum sphere and the ω components over time. Everything draws on the
 * CPU-capable WebGL path; when WebGL cannot start, the text alternative stays.
 */
@Component({
  selector: 'tw-part-viewer',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    MatButton,
    MatButtonToggleGroup,
    MatButtonToggle,
    MatFormField,
    MatLabel,
    MatInput,
    MatHint,
    MatSuffix,
    MatSlider,
    MatSliderThumb,
    NgxEchartsDirective,
    Cautions,
    ErrorBanner,
    LoadingState,
  ],
  providers: [provideCharts()],
  templateUrl: './part-viewer.html',
  styleUrl: './part-viewer.scss',
  host: {
    // How many uploaded meshes the picture holds, is waiting for, or had to leave out.
    '[attr.data-meshes-drawn]': 'uploadedMeshStatus().drawn.length',
    '[attr.data-meshes-pending]': 'uploadedMeshStatus().pending.length',
    '[attr.data-meshes-failed]': 'uploadedMeshStatus().failed.length',
  },
})
export class TwPartViewer {
  /** The part document to draw (SI units; placement angles in degrees). */
  readonly document = input.required<PartDocument>();
  /** Its spin report (centre of mass, principal axes, verdict). */
  readonly report = input.required<SpinReport>();
  /** A simulation already at hand for the document's own misalignment; fetched when absent or when the misalignment changes. */
  readonly simulation = input<SimulationResult | null>(null);
  /** The workspace whose uploaded meshes and materials the document refers to (sent with the motion request). */
  readonly workspaceId = input<string | null>(null);
  /** Where the uploaded meshes of the picture stand, after each drawing (drawn, loading, failed with the reason). */
  readonly uploadedMeshes = output<UploadedMeshStatus>();

  private readonly simulationApi = inject(SimulationApi);
  private readonly requestDelay = inject(TUMBLE_REQUEST_DELAY_MS);
  /** Uploaded meshes, fetched once each through the app's source and drawn again when they arrive. */
  private readonly meshCache = new MeshGeometryCache(inject(MESH_GEOMETRY_SOURCE, { optional: true }), () => this.redrawPart());
  protected readonly uploadedMeshStatus = signal<UploadedMeshStatus>({ drawn: [], pending: [], failed: [] });
  private readonly partCanvas = viewChild.required<ElementRef<HTMLCanvasElement>>('partCanvas');
  private readonly polhodeCanvas = viewChild.required<ElementRef<HTMLCanvasElement>>('polhodeCanvas');

  protected readonly axisRoles = AXIS_ROLES;
  protected readonly axisLabels = AXIS_LABELS;
  protected readonly colours = VIEWER_COLOURS;
  protected readonly speeds = TUMBLE_SPEEDS;
  protected readonly misalignmentRange = MISALIGNMENT_RANGE;
  protected readonly views: { name: ViewName; label: string }[] = [
    { name: 'iso', label: 'Three-quarter' },
    { name: 'front', label: 'Front' },
    { name: 'side', label: 'Side' },
    { name: 'top', label: 'Top' },
  ];

  /** Misalignment of the preview's start from the intended axis (degrees). */
  protected readonly misalignment = linkedSignal(() => this.document().spin.misalignmentDeg ?? 1);
  protected readonly misalignmentError = signal<string | null>(null);
  protected readonly speed = signal<number>(0.25);
  protected readonly playing = signal(false);
  /** Simulated time shown (s), following the animation at READOUT_INTERVAL_MS. */
  protected readonly time = signal(0);
  protected readonly webglError = signal<string | null>(null);

  /** Whether the motion request is on its way (not merely waiting for the edits to pause). */
  private readonly motionRequested = signal(false);
  private readonly motion = rxResource({
    params: () => ({
      document: this.document(),
      report: this.report(),
      misalignmentDeg: this.misalignment(),
      given: this.simulation(),
      workspaceId: this.workspaceId(),
    }),
    stream: ({ params }) => {
      if (params.given && params.misalignmentDeg === (params.document.spin.misalignmentDeg ?? 1)) return of(params.given);
      return timer(this.requestDelay).pipe(
        switchMap(() => {
          this.motionRequested.set(true);
          return this.simulationApi
            .simulate(tumbleRequest(params.document, params.report, params.misalignmentDeg), params.workspaceId)
            .pipe(finalize(() => this.motionRequested.set(false)));
        }),
      );
    },
  });
  protected readonly track = computed(() => (this.motion.hasValue() ? this.motion.value() : null));
  /**
   * The spinner shows while the motion is being computed, not while the preview waits for the
   * edits to pause: a spinner running through every pause in typing would keep the page
   * repainting at the display's rate, which a computer without a GPU does on the CPU.
   */
  protected readonly loadingMotion = computed(() => this.motion.isLoading() && this.motionRequested());
  protected readonly waitingForPause = computed(() => this.motion.isLoading() && !this.motionRequested());
  protected readonly motionError = computed(() => {
    const error = this.motion.error();
    return error ? `The tumble preview could not be computed: ${toApiError(error).message}` : null;
  });
  protected readonly duration = computed(() => {
    const t = this.track();
    return t ? trackDuration(t) : 0;
  });
  /** Time in the air from the report (s); reports stored before it was computed have none. */
  private readonly flightTime = computed(() => this.report().spin.flightTime ?? null);
  protected readonly omegaOptions = computed(() => {
    const t = this.track();
    return t ? omegaChartOptions(t, this.flightTime()) : null;
  });
  /** Where the flight ends on the preview's time axis (per cent of the run, null beyond it) and what the read-out says. */
  protected readonly flightMark = computed(() => {
    const flight = this.flightTime();
    if (flight === null) return null;
    const duration = this.duration();
    const seconds = Number(flight.toPrecision(3));
    const basis = this.report().spin.flightTimeSource === 'part' ? 'set for this part' : 'category default, a common practice estimate';
    const inside = duration > 0 && flight <= duration;
    return {
      percent: inside ? (100 * flight) / duration : null,
      label: inside ? `Flight ends at ${seconds} s (${basis})` : `Flight of ${seconds} s (${basis}) lasts beyond this preview`,
    };
  });
  protected readonly summary = computed(() => tumbleSummary(this.report(), this.track(), this.misalignment()));
  protected readonly canvasLabel = computed(() => {
    const r = this.report();
    const failed = this.uploadedMeshStatus()
      .failed.map((f) => ` The uploaded mesh “${f.id}” is not drawn: ${f.message}.`)
      .join('');
    return `3-D view of ${r.name ?? 'the part'} with its principal axes and intended spin axis.${failed} ${this.playing() ? 'The tumble preview is playing.' : 'The tumble preview is paused.'}`;
  });

  private partStage: ViewerStage | null = null;
  private polhodeStage: ViewerStage | null = null;
  private partScene: PartScene | null = null;
  private polhodeScene: PolhodeScene | null = null;
  private momentumArrow: Group | null = null;
  private readonly stagesReady = signal(false);
  private resizeObserver: ResizeObserver | null = null;
  private frame: number | null = null;
  private lastFrameAt = 0;
  private partRedrawPending = false;
  private lastReadoutAt = 0;
  private simTime = 0;
  private readonly scratchQuaternion = new Quaternion();
  private readonly primitiveGeometries = new PrimitiveGeometryCache();
  private readonly scratchPoint: [number, number, number] = [0, 0, 0];

  constructor() {
    afterNextRender(() => this.startStages());
    inject(DestroyRef).onDestroy(() => this.tearDown());

    // Redraw the part when the document or report changes: after the browser has painted what
    // changed with it, so the figures beside the view show first (a rebuild on a CPU renderer
    // takes tens of milliseconds); changes in between are drawn once, the latest.
    effect(() => {
      this.document();
      this.report();
      if (!this.stagesReady()) return;
      untracked(() => this.schedulePartRedraw());
    });
    // A new motion: rebuild the polhode and the angular-momentum arrow, rewind.
    effect(() => {
      const track = this.track();
      if (!this.stagesReady()) return;
      untracked(() => this.showMotion(track));
    });
  }

  /** Starts or resumes the animation. */
  protected play(): void {
    if (!this.track() || this.playing()) return;
    if (this.simTime >= this.duration()) this.simTime = 0;
    this.playing.set(true);
    this.lastFrameAt = performance.now();
    this.frame = requestAnimationFrame(this.advance);
  }

  /** Stops the animation where it is. */
  protected pause(): void {
    this.playing.set(false);
    if (this.frame !== null) cancelAnimationFrame(this.frame);
    this.frame = null;
    this.time.set(this.simTime);
  }

  /** Jumps to simulated time `t` (s). */
  protected seek(t: number): void {
    this.simTime = Math.min(Math.max(0, t), this.duration());
    this.time.set(this.simTime);
    this.applyTime();
  }

  /** Applies a new playback speed. */
  protected chooseSpeed(value: unknown): void {
    const v = Number(value);
    if ((TUMBLE_SPEEDS as readonly number[]).includes(v)) this.speed.set(v);
  }

  /** Takes the misalignment typed in (degrees); out-of-range input is refused with a message. */
  protected chooseMisalignment(raw: string): void {
    const v = Number(raw);
    if (raw.trim() === '' || !Number.isFinite(v) || v < MISALIGNMENT_RANGE.min || v > MISALIGNMENT_RANGE.max) {
      this.misalignmentError.set(`Misalignment must be a number from ${MISALIGNMENT_RANGE.min}° to ${MISALIGNMENT_RANGE.max}°.`);
      return;
    }
    this.misalignmentError.set(null);
    if (v !== this.misalignment()) {
      this.pause();
      this.misalignment.set(v);
    }
  }

  /** Points the camera from one of the named directions. */
  protected lookFrom(view: ViewName): void {
    this.partStage?.setView(view);
  }

  /** Loads the motion again after a failure. */
  protected retryMotion(): void {
    this.motion.reload();
  }

  private readonly advance = (now: number): void => {
    if (!this.playing()) return;
    const duration = this.duration();
    this.simTime += ((now - this.lastFrameAt) / 1000) * this.speed();
    this.lastFrameAt = now;
    if (duration > 0 && this.simTime > duration) this.simTime %= duration;
    this.applyTime(true);
    if (now - this.lastReadoutAt >= READOUT_INTERVAL_MS) {
      this.lastReadoutAt = now;
      this.time.set(this.simTime);
    }
    this.frame = requestAnimationFrame(this.advance);
  };

  /** Turns the body and moves the polhode marker to the current time; draws at once while playing. */
  private applyTime(immediate = false): void {
    const track = this.track();
    if (!track || !this.partScene) return;
    attitudeAt(this.scratchQuaternion, track, this.simTime);
    this.partScene.body.quaternion.copy(this.scratchQuaternion);
    if (this.polhodeScene) {
      const p = vectorAt(this.scratchPoint, track.polhode, track.times, this.simTime);
      this.polhodeScene.marker.position.set(p[0], p[1], p[2]);
    }
    if (immediate) {
      this.partStage?.renderNow();
      this.polhodeStage?.renderNow();
    } else {
      this.partStage?.requestRender();
      this.polhodeStage?.requestRender();
    }
  }

  private startStages(): void {
    try {
      this.partStage = new ViewerStage(this.partCanvas().nativeElement, VIEWER_COLOURS.background);
      this.polhodeStage = new ViewerStage(this.polhodeCanvas().nativeElement, VIEWER_COLOURS.background);
    } catch (err) {
      this.partStage?.dispose();
      this.partStage = null;
      this.webglError.set(
        'The 3-D view needs WebGL, which this browser could not start. The figures and the description below still apply.',
      );
      if (isDevMode()) console.warn('tw-part-viewer: WebGL did not start', err);
      return;
    }
    this.polhodeStage.frameSphere(1.35, 'iso');
    this.sizeStages();
    if (typeof ResizeObserver !== 'undefined') {
      this.resizeObserver = new ResizeObserver(() => this.sizeStages());
      this.resizeObserver.observe(this.partCanvas().nativeElement);
      this.resizeObserver.observe(this.polhodeCanvas().nativeElement);
    }
    this.stagesReady.set(true);
  }

  private sizeStages(): void {
    for (const [stage, canvas] of [
      [this.partStage, this.partCanvas()],
      [this.polhodeStage, this.polhodeCanvas()],
    ] as const) {
      const el = canvas.nativeElement;
      stage?.resize(el.clientWidth, el.clientHeight);
    }
  }

  private showPart(doc: PartDocument, report: SpinReport): void {
    const stage = this.partStage;
    if (!stage) return;
    const previousReach = this.partScene?.reach ?? null;
    if (this.partScene) disposeObject(this.partScene.body);
    this.partScene = buildPartScene(
      doc,
      report,
      (meshId, scale) => this.meshCache.lookup(meshId, scale),
      this.primitiveGeometries.geometryOf,
    );
    this.primitiveGeometries.keepOnly();
    stage.scene.add(this.partScene.body);
    this.uploadedMeshStatus.set(this.partScene.uploadedMeshes);
    this.uploadedMeshes.emit(this.partScene.uploadedMeshes);
    const reach = this.partScene.reach;
    if (previousReach === null || Math.abs(reach - previousReach) > 0.2 * previousReach) stage.frameSphere(reach * 1.5);
    this.showMomentum(this.track());
    this.applyTime();
    // Without a motion yet applyTime draws nothing: the new picture still has to show.
    stage.requestRender();
  }

  /** Draws the current document on the first turn of the event loop after the next paint. */
  private schedulePartRedraw(): void {
    if (this.partRedrawPending) return;
    this.partRedrawPending = true;
    requestAnimationFrame(() =>
      setTimeout(() => {
        this.partRedrawPending = false;
        this.redrawPart();
      }),
    );
  }

  /** Draws the current document again (an uploaded mesh arrived or failed). */
  private redrawPart(): void {
    if (!this.stagesReady() || !this.partStage) return;
    this.showPart(this.document(), this.report());
  }

  private showMotion(track: SimulationResult | null): void {
    this.pause();
    this.simTime = 0;
    this.time.set(0);
    if (this.polhodeScene) disposeObject(this.polhodeScene.root);
    this.polhodeScene = null;
    if (track && this.polhodeStage) {
      this.polhodeScene = buildPolhodeScene(track.polhode);
      this.polhodeStage.scene.add(this.polhodeScene.root);
    }
    this.showMomentum(track);
    this.applyTime();
    this.polhodeStage?.requestRender();
  }

  /** The fixed angular-momentum vector, in space, drawn from the centre of mass. */
  private showMomentum(track: SimulationResult | null): void {
    if (this.momentumArrow) disposeObject(this.momentumArrow);
    this.momentumArrow = null;
    const stage = this.partStage;
    const L = track?.angularMomentum[0];
    if (!stage || !L || !this.partScene || !(Math.hypot(L[0], L[1], L[2]) > 0)) return;
    const reach = this.partScene.reach;
    this.momentumArrow = axisRod(L, reach * 1.6, reach * 0.012, VIEWER_COLOURS.momentum, false);
    this.momentumArrow.name = 'angular-momentum';
    stage.scene.add(this.momentumArrow);
    stage.requestRender();
  }

  private tearDown(): void {
    if (this.frame !== null) cancelAnimationFrame(this.frame);
    this.frame = null;
    this.resizeObserver?.disconnect();
    this.partStage?.dispose();
    this.polhodeStage?.dispose();
    this.meshCache.dispose();
    this.primitiveGeometries.dispose();
    this.partStage = this.polhodeStage = null;
    this.partScene = this.polhodeScene = null;
    this.momentumArrow = null;
  }
}
