import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { analyzeValidatedPart, simulate } from '@tumblewise/engine';
import type { PartDocument } from '@tumblewise/shared';
import type { Scene } from 'three';
import { MESH_GEOMETRY_SOURCE } from '../scene/mesh-geometry-source';
import type { UploadedMeshStatus } from '../scene/part-scene';
import { TUMBLE_REQUEST_DELAY_MS, TwPartViewer } from './part-viewer';

// jsdom has no WebGL: the renderer is replaced by one that records the scenes it drew.
const scenes: Scene[] = [];
jest.mock('three', () => ({
  ...jest.requireActual('three'),
  WebGLRenderer: jest.fn(() => ({
    setPixelRatio() {},
    setSize() {},
    dispose() {},
    forceContextLoss() {},
    render: (s: Scene) => scenes.push(s),
  })),
}));

// A corner tetrahedron with legs of 50 mm, as an uploaded mesh and as the same solid inline.
const corners = [
  [0, 0, 0],
  [50, 0, 0],
  [0, 50, 0],
  [0, 0, 50],
];
const triangles = [
  [0, 2, 1],
  [0, 1, 3],
  [0, 3, 2],
  [1, 2, 3],
];
const positions = new Float32Array(triangles.flatMap((t) => t.flatMap((k) => corners[k])));
const scan = {
  id: 'scan',
  shape: 'mesh',
  meshId: 'mesh-1',
  scale: 0.001,
  position: [0, 0, 0],
  rotationDeg: [0, 0, 0],
  density: 900,
  mode: 'add',
};
const DOC = {
  name: 'Scan',
  primitives: [scan],
  spin: { axis: [0, 0, 1], rate: 5, misalignmentDeg: 1 },
  dissipative: false,
} as unknown as PartDocument;
const INLINE = { ...DOC, primitives: [{ ...scan, meshId: undefined, vertices: corners, triangles }] } as unknown as PartDocument;
const REPORT = analyzeValidatedPart(INLINE);
const SIMULATION = simulate({ part: INLINE, misalignmentDeg: 1, seconds: 1, sampleRate: 60 });

class QuietResizeObserver {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}

describe('TwPartViewer with uploaded meshes', () => {
  beforeEach(() => {
    scenes.length = 0;
    (globalThis as { ResizeObserver?: unknown }).ResizeObserver = QuietResizeObserver;
  });
  afterEach(() => delete (globalThis as { ResizeObserver?: unknown }).ResizeObserver);

  async function open(
    source: ((id: string) => Promise<Float32Array>) | null,
    motion: { given: boolean; workspaceId?: string } = { given: true },
  ) {
    TestBed.configureTestingModule({
      imports: [TwPartViewer],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: TUMBLE_REQUEST_DELAY_MS, useValue: 0 },
        ...(source ? [{ provide: MESH_GEOMETRY_SOURCE, useValue: source }] : []),
      ],
    });
    const fixture = TestBed.createComponent(TwPartViewer);
    const statuses: UploadedMeshStatus[] = [];
    fixture.componentInstance.uploadedMeshes.subscribe((s) => statuses.push(s));
    fixture.componentRef.setInput('document', DOC);
    fixture.componentRef.setInput('report', REPORT);
    fixture.componentRef.setInput('simulation', motion.given ? SIMULATION : null);
    if (motion.workspaceId) fixture.componentRef.setInput('workspaceId', motion.workspaceId);
    if (motion.given) await fixture.whenStable();
    else
      for (let i = 0; i < 3; i++) {
        await new Promise((r) => setTimeout(r, 0));
        fixture.detectChanges();
      }
    // The part is drawn after the next paint (the frame, then the task after it).
    await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)));
    fixture.detectChanges();
    return { fixture, statuses, host: fixture.nativeElement as HTMLElement };
  }

  it('fetches the mesh through the app’s source, draws it when it arrives and counts it on the element', async () => {
    let release: (p: Float32Array) => void = () => undefined;
    const source = jest.fn((_id: string) => new Promise<Float32Array>((r) => (release = r)));
    const { fixture, statuses, host } = await open(source);
    expect(source).toHaveBeenCalledWith('mesh-1');
    expect(host.getAttribute('data-meshes-pending')).toBe('1');
    expect(host.getAttribute('data-meshes-drawn')).toBe('0');
    release(positions);
    await new Promise((r) => setTimeout(r, 0));
    await fixture.whenStable();
    await new Promise((r) => requestAnimationFrame(() => r(null))); // the redrawn view's frame
    expect(host.getAttribute('data-meshes-drawn')).toBe('1');
    expect(host.getAttribute('data-meshes-pending')).toBe('0');
    expect(statuses.at(-1)).toEqual({ drawn: ['scan'], pending: [], failed: [] });
    expect(scenes.some((s) => s.getObjectByName('add:scan'))).toBe(true);
    expect(source).toHaveBeenCalledTimes(1);
    fixture.destroy();
  });

  it('leaves out a mesh that fails, says why in the view’s description, and does not throw', async () => {
    const { fixture, host } = await open(() => Promise.reject(new Error('Mesh was not found.')));
    await new Promise((r) => setTimeout(r, 0));
    await fixture.whenStable();
    expect(host.getAttribute('data-meshes-failed')).toBe('1');
    const label = host.querySelector('[data-testid="viewer-canvas"]')!.getAttribute('aria-label')!;
    expect(label).toContain('The uploaded mesh “scan” is not drawn: Mesh was not found.');
    fixture.destroy();
  });

  it('without a source lists the mesh as not drawn', async () => {
    const { fixture, host } = await open(null);
    expect(host.getAttribute('data-meshes-failed')).toBe('1');
    fixture.destroy();
  });

  it('draws an arrived mesh before the motion is in, and asks for the motion in the workspace', async () => {
    const { fixture, host } = await open(async () => positions, { given: false, workspaceId: 'ws-9' });
    const backend = TestBed.inject(HttpTestingController);
    const call = backend.expectOne((r) => r.url === '/api/v1/simulate');
    expect(call.request.params.get('workspace')).toBe('ws-9');
    await new Promise((r) => setTimeout(r, 20));
    fixture.detectChanges();
    expect(host.getAttribute('data-meshes-drawn')).toBe('1');
    // A frame was drawn with the mesh in it although there is no motion yet.
    await new Promise((r) => requestAnimationFrame(() => r(null)));
    expect(scenes.some((s) => s.getObjectByName('add:scan'))).toBe(true);
    call.flush(SIMULATION);
    fixture.destroy();
  });
});
