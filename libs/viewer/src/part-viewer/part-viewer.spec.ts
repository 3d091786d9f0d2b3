import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { analyzeValidatedPart, simulate, type SimulationResult } from '@tumblewise/engine';
import { BufferGeometry, Quaternion, type Scene } from 'three';
import { PRACTICE_RACKET } from '../testing/demo-parts';
import { TUMBLE_REQUEST_DELAY_MS, TwPartViewer } from './part-viewer';

// jsdom has no WebGL: only the renderer is replaced, by one that records what it was asked to draw.
const renderers: FakeRenderer[] = [];
class FakeRenderer {
  readonly frames: { quaternion: Quaternion | null }[] = [];
  readonly dispose = jest.fn();
  readonly forceContextLoss = jest.fn();
  constructor(readonly options: { canvas: HTMLCanvasElement; preserveDrawingBuffer?: boolean }) {
    if (failNextRenderer) {
      failNextRenderer = false;
      throw new Error('Error creating WebGL context.');
    }
    renderers.push(this);
  }
  setPixelRatio(): void {}
  setSize(): void {}
  render(scene: Scene): void {
    const body = scene.getObjectByName('body');
    this.frames.push({ quaternion: body ? body.quaternion.clone() : null });
  }
}
let failNextRenderer = false;
jest.mock('three', () => ({ ...jest.requireActual('three'), WebGLRenderer: jest.fn((options) => new FakeRenderer(options)) }));

// jsdom lacks ResizeObserver, which the chart directive needs; a stand-in that never fires.
class QuietResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}

const REPORT = analyzeValidatedPart(PRACTICE_RACKET);
// The demo racket's own simulation, computed by the engine here rather than stored numbers.
const SIMULATION: SimulationResult = simulate({ part: PRACTICE_RACKET, misalignmentDeg: 1, seconds: 4, sampleRate: 120 });

describe('TwPartViewer', () => {
  let fixture: ComponentFixture<TwPartViewer>;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let frameCallbacks: Map<number, FrameRequestCallback>;
  let nextFrameId: number;
  let now: number;

  /** Runs the queued animation frames once, `ms` later. */
  function runFrames(ms: number): void {
    now += ms;
    const due = [...frameCallbacks.values()];
    frameCallbacks.clear();
    due.forEach((cb) => cb(now));
  }

  async function open(simulation: SimulationResult | null, requestDelay = 0): Promise<void> {
    renderers.length = 0;
    frameCallbacks = new Map();
    nextFrameId = 1;
    now = 1000;
    (globalThis as { ResizeObserver?: unknown }).ResizeObserver = QuietResizeObserver;
    jest.spyOn(globalThis, 'requestAnimationFrame').mockImplementation((cb) => {
      frameCallbacks.set(nextFrameId, cb);
      return nextFrameId++;
    });
    jest.spyOn(globalThis, 'cancelAnimationFrame').mockImplementation((id) => void frameCallbacks.delete(id));
    jest.spyOn(performance, 'now').mockImplementation(() => now);
    TestBed.configureTestingModule({
      imports: [TwPartViewer],
      providers: [
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: TUMBLE_REQUEST_DELAY_MS, useValue: requestDelay },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [],
      user: {
        id: '5e4d3c2b-1a09-4f8e-b7d6-c5b4a3928170',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: '2026-11-02T09:00:00.000Z',
      },
    });
    fixture = TestBed.createComponent(TwPartViewer);
    fixture.componentRef.setInput('document', PRACTICE_RACKET);
    fixture.componentRef.setInput('report', REPORT);
    fixture.componentRef.setInput('simulation', simulation);
    host = fixture.nativeElement;
    // While the motion is being fetched the view is not stable; let the zero-delay request go out.
    if (simulation) await fixture.whenStable();
    else await settle();
    await partDrawn();
  }

  /** Lets the part's deferred redraw run: the next frame, then the task after it. */
  async function partDrawn(): Promise<void> {
    runFrames(0);
    await new Promise((resolve) => setTimeout(resolve, 0));
    fixture.detectChanges();
  }

  /** Lets queued macrotasks run (the zero-delay request timer), then updates the view. */
  async function settle(): Promise<void> {
    for (let i = 0; i < 3; i++) {
      await new Promise((resolve) => setTimeout(resolve, 0));
      fixture.detectChanges();
    }
  }

  afterEach(() => {
    backend.verify();
    jest.restoreAllMocks();
    delete (globalThis as { ResizeObserver?: unknown }).ResizeObserver;
  });

  const testId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);

  it('draws the part on a preserved drawing buffer and describes it in words', async () => {
    await open(SIMULATION);
    expect(renderers).toHaveLength(2);
    expect(renderers[0].options.canvas).toBe(testId('viewer-canvas'));
    expect(renderers[0].options.preserveDrawingBuffer).toBe(true);
    runFrames(16);
    expect(renderers[0].frames.length).toBeGreaterThan(0);
    expect(renderers[1].frames.length).toBeGreaterThan(0);
    const summary = testId('tumble-summary')!.textContent!;
    expect(summary).toContain(`Verdict: ${REPORT.spin.verdict}`);
    expect(summary).toContain('angular-momentum vector stays fixed');
    expect(testId('viewer-legend')!.textContent).toContain('Intermediate axis');
    expect(host.querySelector('[data-testid="cautions"]')?.textContent).toContain('cleared area');
  });

  it('plays: each frame turns the body to the attitude of the motion, pause stops it', async () => {
    await open(SIMULATION);
    runFrames(16);
    testId('tumble-play')!.click();
    await fixture.whenStable();
    const drawn = () => renderers[0].frames.map((f) => f.quaternion!).filter(Boolean);
    const before = drawn().length;
    runFrames(100);
    runFrames(100);
    const frames = drawn().slice(before);
    expect(frames.length).toBeGreaterThanOrEqual(2);
    // At the default 0.25× the second frame shows simulated time 0.05 s; its attitude is the sample's.
    const t = 0.05;
    const k = SIMULATION.times.findIndex((x) => Math.abs(x - t) < 1e-9);
    const a = SIMULATION.attitude[k];
    expect(frames[1].angleTo(new Quaternion(a[0], a[1], a[2], a[3]))).toBeLessThan(1e-6);
    expect(frames[0].angleTo(frames[1])).toBeGreaterThan(0.01);
    await fixture.whenStable();
    testId('tumble-pause')!.click();
    await fixture.whenStable();
    expect(testId('tumble-play')).not.toBeNull();
    const stoppedAt = drawn().length;
    runFrames(100);
    runFrames(100);
    const last = drawn()[stoppedAt - 1];
    drawn()
      .slice(stoppedAt)
      .forEach((q) => expect(q.angleTo(last)).toBe(0));
  });

  it('asks the server for the motion when none is given, and again for a new misalignment', async () => {
    await open(null);
    const first = backend.expectOne('/api/v1/simulate');
    expect(first.request.headers.get('Authorization')).toBe('Bearer token-one');
    expect(first.request.body).toMatchObject({ part: PRACTICE_RACKET, misalignmentDeg: 1 });
    expect(first.request.body.seconds * first.request.body.sampleRate).toBeLessThanOrEqual(20_000);
    first.flush(SIMULATION);
    await settle();
    expect(testId('tumble-play')!.hasAttribute('disabled')).toBe(false);

    const input = testId('tumble-misalignment') as HTMLInputElement;
    input.value = '45';
    input.dispatchEvent(new Event('change'));
    await settle();
    expect(testId('tumble-misalignment-error')!.textContent).toContain('from 0.1° to 20°');
    backend.expectNone('/api/v1/simulate');

    input.value = '3';
    input.dispatchEvent(new Event('change'));
    await settle();
    const second = backend.expectOne('/api/v1/simulate');
    expect(second.request.body.misalignmentDeg).toBe(3);
    second.flush(
      { error: { code: 'unanalysable', message: 'The part cannot be analysed.' } },
      { status: 422, statusText: 'Unprocessable Entity' },
    );
    await settle();
    expect(testId('error-banner')!.textContent).toContain('The part cannot be analysed.');
  });

  it('shows the spinner only while the motion is computed, not while it waits for the edits to pause', async () => {
    // Waiting: a still line of text (an animated spinner would repaint the page at every frame).
    await open(null, 60_000);
    expect(testId('tumble-waiting')!.textContent).toContain('once you pause');
    expect(testId('loading')).toBeNull();
    backend.expectNone('/api/v1/simulate');
    fixture.destroy();
    TestBed.resetTestingModule();

    // Asked: the spinner, until the motion is there.
    await open(null);
    const request = backend.expectOne('/api/v1/simulate');
    expect(testId('loading')!.textContent).toContain('Computing the motion');
    expect(testId('tumble-waiting')).toBeNull();
    request.flush(SIMULATION);
    await settle();
    expect(testId('loading')).toBeNull();
    expect(testId('tumble-waiting')).toBeNull();
  });

  it('marks where the flight ends on the time axis, and says so beside the time read-out', async () => {
    await open(SIMULATION);
    expect(testId('tumble-flight')).toBeNull(); // the demo racket names no category and no flight time
    fixture.componentRef.setInput('report', analyzeValidatedPart({ ...PRACTICE_RACKET, flightTime: 1.5 }));
    await fixture.whenStable();
    expect(testId('tumble-flight')!.textContent!.trim()).toBe('Flight ends at 1.5 s (set for this part)');
    // 1.5 s of the 4 s run: the tick sits at that fraction of the track.
    expect(Number(testId('tumble-flight-tick')!.style.getPropertyValue('--tw-at'))).toBeCloseTo(1.5 / 4, 12);
    fixture.componentRef.setInput('report', analyzeValidatedPart({ ...PRACTICE_RACKET, flightTime: 9 }));
    await fixture.whenStable();
    expect(testId('tumble-flight')!.textContent!.trim()).toBe('Flight of 9 s (set for this part) lasts beyond this preview');
    expect(testId('tumble-flight-tick')).toBeNull();
  });

  it('frees the renderers and geometries when destroyed', async () => {
    await open(SIMULATION);
    const disposed = jest.spyOn(BufferGeometry.prototype, 'dispose');
    fixture.destroy();
    expect(renderers[0].dispose).toHaveBeenCalled();
    expect(renderers[1].dispose).toHaveBeenCalled();
    expect(renderers[0].forceContextLoss).toHaveBeenCalled();
    expect(disposed.mock.calls.length).toBeGreaterThan(10);
  });

  it('keeps the words and says why when WebGL cannot start', async () => {
    failNextRenderer = true;
    await open(SIMULATION);
    expect(testId('viewer-no-webgl')!.textContent).toContain('needs WebGL');
    expect(testId('tumble-summary')!.textContent).toContain('Verdict');
  });
});
