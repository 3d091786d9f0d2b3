import { meshArraysFromData } from './mesh-arrays';
import type { MeshArraysReply, MeshArraysRequest } from './mesh-arrays-builder';

/** A stand-in for the mesh-drawing worker: answers each job as the worker script does, later and in reverse order. */
class FakeWorker {
  static started: FakeWorker[] = [];
  onmessage: ((e: { data: MeshArraysReply }) => void) | null = null;
  onerror: ((e: { preventDefault(): void }) => void) | null = null;
  jobs: MeshArraysRequest[] = [];
  terminated = false;
  constructor() {
    FakeWorker.started.push(this);
  }
  postMessage(job: MeshArraysRequest) {
    this.jobs.push(job);
  }
  terminate() {
    this.terminated = true;
  }
  answerAll() {
    for (const { id, data, scale } of [...this.jobs].reverse()) {
      try {
        this.onmessage?.({ data: { id, ok: true, arrays: meshArraysFromData(data, scale) } });
      } catch (err) {
        this.onmessage?.({ data: { id, ok: false, message: (err as Error).message } });
      }
    }
    this.jobs = [];
  }
}

jest.mock('./mesh-arrays-thread', () => ({ startMeshArraysWorker: () => new FakeWorker() }));
import { MeshArraysBuilder } from './mesh-arrays-builder'; // after the mock it uses

const triangle = (size: number) => new Float32Array([0, 0, 0, size, 0, 0, 0, size, 0]);

describe('MeshArraysBuilder', () => {
  beforeEach(() => {
    FakeWorker.started = [];
  });

  it('sends each build to one worker and gives every answer to its own caller', async () => {
    const builder = new MeshArraysBuilder();
    const small = builder.build(triangle(1), 1),
      large = builder.build(triangle(5), 2),
      broken = builder.build(new Float32Array(4), 1);
    expect(FakeWorker.started).toHaveLength(1);
    FakeWorker.started[0].answerAll();
    expect((await small).positions[3]).toBe(1);
    expect((await large).positions[3]).toBe(10);
    await expect(broken).rejects.toThrow('no complete triangles');
  });

  it('finishes the waiting builds on the page when the worker fails, and ends the worker when disposed', async () => {
    const builder = new MeshArraysBuilder();
    const waiting = builder.build(triangle(3), 1);
    const worker = FakeWorker.started[0];
    worker.onerror?.({ preventDefault: () => undefined });
    expect(worker.terminated).toBe(true);
    expect((await waiting).positions[3]).toBe(3);
    // From then on it builds on the page at once.
    const now = builder.build(triangle(4), 1);
    expect(now).not.toBeInstanceOf(Promise);
    const other = new MeshArraysBuilder();
    void other.build(triangle(1), 1);
    other.dispose();
    expect(FakeWorker.started[1].terminated).toBe(true);
  });
});
