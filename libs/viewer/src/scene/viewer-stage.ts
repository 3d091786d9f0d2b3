import { AmbientLight, Color, DirectionalLight, PerspectiveCamera, Scene, Vector3, WebGLRenderer } from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';
import { disposeObject } from './dispose-object';
import { isSoftwareWebGL } from './software-webgl';

/** Named camera directions of the view buttons (part coordinates, z up). */
export const VIEW_DIRECTIONS = {
  iso: [1, -1.3, 0.8],
  front: [0, -1, 0],
  side: [1, 0, 0],
  top: [0, -1e-3, 1],
} as const satisfies Record<string, readonly [number, number, number]>;
export type ViewName = keyof typeof VIEW_DIRECTIONS;

/**
 * One canvas with its WebGL renderer, scene, lights, camera and orbit controls, drawn on demand
 * (one frame per request, coalesced into the next animation frame). z is up, as in part coordinates.
 * The drawing buffer is preserved so the picture can be read back (tests, saving an image).
 */
export class ViewerStage {
  /** Objects added here are drawn. */
  readonly scene = new Scene();
  readonly camera = new PerspectiveCamera(35, 1, 1e-3, 100);
  readonly controls: OrbitControls;
  private readonly renderer: WebGLRenderer;
  private frame: number | null = null;
  private radius = 1;
  private disposed = false;

  /** Throws when WebGL cannot start (the caller shows its text alternative instead). */
  constructor(
    private readonly canvas: HTMLCanvasElement,
    background: string,
  ) {
    // Smooth edges where a GPU draws; on a CPU renderer multisampling costs more than the drawing.
    this.renderer = new WebGLRenderer({ canvas, antialias: !isSoftwareWebGL(), preserveDrawingBuffer: true, powerPreference: 'low-power' });
    this.renderer.setPixelRatio(Math.min(globalThis.devicePixelRatio ?? 1, 2));
    this.scene.background = new Color(background);
    this.scene.add(new AmbientLight('#ffffff', 1.2));
    const key = new DirectionalLight('#ffffff', 2.2);
    key.position.set(2, -3, 4);
    const fill = new DirectionalLight('#ffffff', 0.8);
    fill.position.set(-3, 2, -1);
    this.scene.add(key, fill);
    this.camera.up.set(0, 0, 1);
    this.controls = new OrbitControls(this.camera, canvas);
    this.controls.enableDamping = false;
    this.controls.listenToKeyEvents(canvas);
    this.controls.addEventListener('change', () => this.requestRender());
  }

  /** Fits the camera to a sphere of `radius` about the origin, looking from `view`. */
  frameSphere(radius: number, view: ViewName = 'iso'): void {
    this.radius = radius;
    const d = new Vector3(...VIEW_DIRECTIONS[view]).normalize();
    const distance = (radius / Math.sin((this.camera.fov * Math.PI) / 360)) * 1.05;
    this.camera.position.copy(d.multiplyScalar(distance));
    this.camera.near = distance / 100;
    this.camera.far = distance * 10;
    this.camera.updateProjectionMatrix();
    this.controls.target.set(0, 0, 0);
    this.controls.minDistance = radius * 0.5;
    this.controls.maxDistance = distance * 4;
    this.controls.update();
    this.requestRender();
  }

  /** Looks from one of the named directions at the current framing. */
  setView(view: ViewName): void {
    this.frameSphere(this.radius, view);
  }

  /** Matches the drawing buffer to the canvas's laid-out size (CSS pixels). */
  resize(width: number, height: number): void {
    if (width <= 0 || height <= 0) return;
    this.renderer.setSize(width, height, false);
    this.camera.aspect = width / height;
    this.camera.updateProjectionMatrix();
    this.requestRender();
  }

  /** Draws once in the next animation frame (several requests in one frame draw once). */
  requestRender(): void {
    if (this.disposed || this.frame !== null) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = null;
      this.renderNow();
    });
  }

  /** Draws at once. */
  renderNow(): void {
    if (this.disposed) return;
    this.renderer.render(this.scene, this.camera);
  }

  /** Frees the renderer, the controls' listeners and everything in the scene. */
  dispose(): void {
    if (this.disposed) return;
    this.disposed = true;
    if (this.frame !== null) cancelAnimationFrame(this.frame);
    this.controls.dispose();
    for (const child of [...this.scene.children]) disposeObject(child);
    this.renderer.forceContextLoss();
    this.renderer.dispose();
  }
}
