import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { Measurement } from '@tumblewise/shared';
import { ApiError } from '../errors/api-error';
import { errorInterceptor } from '../errors/error-interceptor';
import { HARBOUR_WORKSPACE } from '../testing/session-fixture';
import { MeasurementsApi, type MeasurementUpload } from './measurements-api';

// Invented variant, import and rig reading; the problems are written the way the server builds them
// (server/src/measurements/measurement-csv.ts).
const VARIANT_ID = '60000000-0000-4000-8000-000000000002';
const IMPORT_ID = '80000000-0000-4000-8000-000000000001';
const URL = `/api/v1/workspaces/${HARBOUR_WORKSPACE.id}/variants/${VARIANT_ID}/measurements`;
const ROW: Measurement = {
  id: '70000000-0000-4000-8000-000000000001',
  axis: 'major',
  value: 0.0123,
  enteredValue: 123000,
  enteredUnit: 'g·cm²',
  method: 'compound pendulum',
  predicted: 0.012,
  differencePercent: 2.5,
  importId: '80000000-0000-4000-8000-000000000001',
  createdAt: '2026-11-30T10:00:00.000Z',
};

describe('MeasurementsApi', () => {
  let api: MeasurementsApi;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()] });
    api = TestBed.inject(MeasurementsApi);
    backend = TestBed.inject(HttpTestingController);
  });
  afterEach(() => backend.verify());

  it('lists a variant’s measurements', () => {
    let rows: Measurement[] | undefined;
    api.list(HARBOUR_WORKSPACE.id, VARIANT_ID).subscribe((r) => (rows = r));
    const call = backend.expectOne(URL);
    expect(call.request.method).toBe('GET');
    call.flush([ROW]);
    expect(rows).toEqual([ROW]);
  });

  it('posts the file as the multipart field "file" and reports progress, then the rows', () => {
    const steps: MeasurementUpload[] = [];
    let completed = false;
    const csv = new Blob(['axis,value,unit,method\nmajor,123000,g·cm²,compound pendulum\n'], { type: 'text/csv' });
    api
      .upload(HARBOUR_WORKSPACE.id, VARIANT_ID, csv, 'rig-a.csv')
      .subscribe({ next: (s) => steps.push(s), complete: () => (completed = true) });
    const call = backend.expectOne(URL);
    expect(call.request.method).toBe('POST');
    expect(call.request.reportProgress).toBe(true);
    const body = call.request.body as FormData;
    expect(body).toBeInstanceOf(FormData);
    const file = body.get('file') as File;
    expect(file.name).toBe('rig-a.csv');
    expect(file.size).toBe(csv.size);
    call.event({ type: HttpEventType.Sent });
    call.event({ type: HttpEventType.UploadProgress, loaded: 30, total: 120 });
    call.event({ type: HttpEventType.UploadProgress, loaded: 50 });
    call.flush([ROW], { status: 201, statusText: 'Created' });
    expect(steps).toEqual([
      { kind: 'progress', fraction: 0.25 },
      { kind: 'progress', fraction: null },
      { kind: 'done', rows: [ROW] },
    ]);
    expect(completed).toBe(true);
  });

  it('fails with the server’s refusal, carrying its problems by line', () => {
    let failure: unknown;
    api.upload(HARBOUR_WORKSPACE.id, VARIANT_ID, new Blob(['x'])).subscribe({ error: (e) => (failure = e) });
    const problems = [
      { line: 3, message: 'value "-3" must be a positive number' },
      { line: 4, message: 'unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)' },
    ];
    backend
      .expectOne(URL)
      .flush(
        { error: { code: 'invalid_input', message: 'The CSV was not imported: line 3: …', field: 'file', problems } },
        { status: 400, statusText: 'Bad Request' },
      );
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ status: 400, field: 'file', problems });
  });

  it('removes one row', () => {
    let answer: unknown;
    api.remove(HARBOUR_WORKSPACE.id, VARIANT_ID, ROW.id).subscribe((r) => (answer = r));
    const call = backend.expectOne(`${URL}/${ROW.id}`);
    expect(call.request.method).toBe('DELETE');
    call.flush({ removed: 1 });
    expect(answer).toEqual({ removed: 1 });
  });

  it('removes one import as a whole', () => {
    let answer: unknown;
    api.removeImport(HARBOUR_WORKSPACE.id, VARIANT_ID, IMPORT_ID).subscribe((r) => (answer = r));
    const call = backend.expectOne(`${URL}/imports/${IMPORT_ID}`);
    expect(call.request.method).toBe('DELETE');
    call.flush({ removed: 3 });
    expect(answer).toEqual({ removed: 3 });
  });

  it('fails with a 404 when the import is gone', () => {
    let failure: unknown;
    api.removeImport(HARBOUR_WORKSPACE.id, VARIANT_ID, IMPORT_ID).subscribe({ error: (e) => (failure = e) });
    backend
      .expectOne(`${URL}/imports/${IMPORT_ID}`)
      .flush({ error: { code: 'not_found', message: 'Import was not found.' } }, { status: 404, statusText: 'Not Found' });
    expect(failure).toMatchObject({ status: 404, code: 'not_found', problems: [] });
  });
});
