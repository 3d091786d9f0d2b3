import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { Mesh } from '@tumblewise/shared';
import { ApiError } from '../errors/api-error';
import { errorInterceptor } from '../errors/error-interceptor';
import { MeshesApi, type MeshUploadEvent } from './meshes-api';

const BLOCK: Mesh = {
  id: '11111111-1111-4111-8111-111111111111',
  name: 'block.stl',
  sha256: 'a'.repeat(64),
  byteSize: 684,
  triangleCount: 12,
  format: 'binary',
  report: { fixed: [], warnings: [] },
  createdAt: '2026-03-01T10:00:00.000Z',
};
const WS = 'ws-1';

describe('MeshesApi', () => {
  let api: MeshesApi;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()] });
    api = TestBed.inject(MeshesApi);
    backend = TestBed.inject(HttpTestingController);
  });
  afterEach(() => backend.verify());

  it('lists and reads the workspace’s meshes', () => {
    let list: Mesh[] = [];
    let one: Mesh | null = null;
    api.list(WS).subscribe((l) => (list = l));
    api.get(WS, BLOCK.id).subscribe((m) => (one = m));
    backend.expectOne({ method: 'GET', url: '/api/v1/workspaces/ws-1/meshes' }).flush([BLOCK]);
    backend.expectOne({ method: 'GET', url: `/api/v1/workspaces/ws-1/meshes/${BLOCK.id}` }).flush(BLOCK);
    expect(list).toEqual([BLOCK]);
    expect(one).toEqual(BLOCK);
  });

  it('uploads the file as multipart field "file" with its name and reports progress, then the check, then the mesh', () => {
    const events: MeshUploadEvent[] = [];
    let completed = false;
    const file = new Blob([new Uint8Array(684)], { type: 'model/stl' });
    api.upload(WS, file, 'block.stl', '  Block  ').subscribe({ next: (e) => events.push(e), complete: () => (completed = true) });
    const call = backend.expectOne({ method: 'POST', url: '/api/v1/workspaces/ws-1/meshes' });
    const body = call.request.body as FormData;
    expect(body).toBeInstanceOf(FormData);
    expect((body.get('file') as File).name).toBe('block.stl');
    expect((body.get('file') as File).size).toBe(684);
    expect(body.get('name')).toBe('Block');
    expect(call.request.reportProgress).toBe(true);
    // HttpClient itself announces Sent; then the transport's progress.
    call.event({ type: HttpEventType.UploadProgress, loaded: 171, total: 684 });
    call.event({ type: HttpEventType.UploadProgress, loaded: 684, total: 684 });
    call.flush(BLOCK, { status: 201, statusText: 'Created' });
    expect(events).toEqual([
      { kind: 'uploading', fraction: null },
      { kind: 'uploading', fraction: 0.25 },
      { kind: 'checking' },
      { kind: 'done', mesh: BLOCK },
    ]);
    expect(completed).toBe(true);
  });

  it('leaves the name out when none is given', () => {
    api.upload(WS, new Blob(['solid x']), 'x.stl').subscribe();
    const call = backend.expectOne('/api/v1/workspaces/ws-1/meshes');
    expect((call.request.body as FormData).has('name')).toBe(false);
    call.flush(BLOCK);
  });

  it('fails with the server’s message and field when the check refuses the file', () => {
    let failure: unknown;
    api.upload(WS, new Blob(['x']), 'open.stl').subscribe({ error: (e) => (failure = e) });
    backend
      .expectOne('/api/v1/workspaces/ws-1/meshes')
      .flush(
        { error: { code: 'mesh_invalid', message: 'The STL cannot be used: the mesh is not closed (4 boundary edges).', field: 'file' } },
        { status: 422, statusText: 'Unprocessable Entity' },
      );
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ status: 422, code: 'mesh_invalid', field: 'file', message: expect.stringMatching(/not closed/) });
  });

  it('fetches the geometry as bytes and deletes by id', () => {
    let bytes: ArrayBuffer | null = null;
    let deleted = false;
    api.geometry(WS, BLOCK.id).subscribe((b) => (bytes = b));
    api.delete(WS, BLOCK.id).subscribe(() => (deleted = true));
    const geo = backend.expectOne(`/api/v1/workspaces/ws-1/meshes/${BLOCK.id}/geometry`);
    expect(geo.request.responseType).toBe('arraybuffer');
    geo.flush(new Uint8Array([1, 2, 3]).buffer);
    backend
      .expectOne({ method: 'DELETE', url: `/api/v1/workspaces/ws-1/meshes/${BLOCK.id}` })
      .flush(null, { status: 204, statusText: 'No Content' });
    expect(Array.from(new Uint8Array(bytes!))).toEqual([1, 2, 3]);
    expect(deleted).toBe(true);
  });

  it('asks where a mesh is used, and fails a refused deletion with the server’s 409', () => {
    let usage: unknown;
    let failure: unknown;
    const parts = [
      {
        partId: '22222222-2222-4222-8222-222222222222',
        projectId: '33333333-3333-4333-8333-333333333333',
        partName: 'Head core',
        inDraft: true,
        variantNumbers: [1],
      },
    ];
    api.usage(WS, BLOCK.id).subscribe((u) => (usage = u));
    backend.expectOne({ method: 'GET', url: `/api/v1/workspaces/ws-1/meshes/${BLOCK.id}/usage` }).flush({ parts });
    expect(usage).toEqual({ parts });
    api.delete(WS, BLOCK.id).subscribe({ error: (e) => (failure = e) });
    backend.expectOne({ method: 'DELETE', url: `/api/v1/workspaces/ws-1/meshes/${BLOCK.id}` }).flush(
      {
        error: {
          code: 'mesh_in_use',
          message: 'The mesh “block.stl” is still used by Head core (its draft and saved variant v1), so it cannot be deleted.',
          field: 'meshId',
        },
      },
      { status: 409, statusText: 'Conflict' },
    );
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ status: 409, code: 'mesh_in_use', field: 'meshId' });
  });
});
