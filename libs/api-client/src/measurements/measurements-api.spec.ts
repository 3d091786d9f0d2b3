import { HttpEventType, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { Measurement } from '@tumblewise/shared';
import { ApiError } from '../errors/api-error';
import { errorInterceptor } from '../errors/error-interceptor';
import { HARBOUR_WORKSPACE } from '../testing/session-fixture';
import { csvProblemsOf, MeasurementsApi, type MeasurementUpload } from './measurements-api';

// Invented variant and rig reading; the error messages are written the way the server builds them
// (server/src/measurements/measurement-routes.ts and measurement-csv.ts).
const VARIANT_ID = '60000000-0000-4000-8000-000000000002';
const URL = `/api/v1/workspaces/${HARBOUR_WORKSPACE.id}/variants/${VARIANT_ID}/measurements`;
const ROW: Measurement = {
  id: '70000000-0000-4000-8000-000000000001', axis: 'major', value: 0.0123, enteredValue: 123000, enteredUnit: 'g·cm²', method: 'compound pendulum',
  predicted: 0.012, differencePercent: 2.5, createdAt: '2026-11-30T10:00:00.000Z',
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
    api.upload(HARBOUR_WORKSPACE.id, VARIANT_ID, csv, 'rig-a.csv').subscribe({ next: (s) => steps.push(s), complete: () => (completed = true) });
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

  it('fails with the server’s refusal, whose problems read by line', () => {
    let failure: unknown;
    api.upload(HARBOUR_WORKSPACE.id, VARIANT_ID, new Blob(['x'])).subscribe({ error: (e) => (failure = e) });
    const message = 'The CSV was not imported: line 3: value "-3" must be a positive number; line 4: axis must be 1–120 characters; line 4: unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …).';
    backend.expectOne(URL).flush({ error: { code: 'invalid_input', message, field: 'file' } }, { status: 400, statusText: 'Bad Request' });
    expect(failure).toBeInstanceOf(ApiError);
    expect(csvProblemsOf(failure as ApiError)).toEqual([
      { line: 3, message: 'value "-3" must be a positive number' },
      { line: 4, message: 'axis must be 1–120 characters' },
      { line: 4, message: 'unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)' },
    ]);
  });
});

describe('csvProblemsOf', () => {
  const refusal = (message: string) => ({ status: 400, field: 'file', message });

  it('keeps a problem about the whole file without a line number', () => {
    expect(csvProblemsOf(refusal('The CSV was not imported: the file has a header but no measurements.'))).toEqual([
      { line: null, message: 'the file has a header but no measurements' },
    ]);
    expect(csvProblemsOf(refusal('The CSV was not imported: line 1: the header must be axis,value,unit,method (found a,b,c,d).'))).toEqual([
      { line: 1, message: 'the header must be axis,value,unit,method (found a,b,c,d)' },
    ]);
  });

  it('does not split inside a quoted value that holds a semicolon', () => {
    expect(csvProblemsOf(refusal('The CSV was not imported: line 2: value "1; 2" must be a positive number; line 5: expected 4 columns, found 3.'))).toEqual([
      { line: 2, message: 'value "1; 2" must be a positive number' },
      { line: 5, message: 'expected 4 columns, found 3' },
    ]);
  });

  it('counts the problems the server left out', () => {
    const listed = Array.from({ length: 20 }, (_, i) => `line ${i + 2}: value "x" must be a positive number`).join('; ');
    const problems = csvProblemsOf(refusal(`The CSV was not imported: ${listed} (and 7 more).`));
    expect(problems).toHaveLength(21);
    expect(problems[19]).toEqual({ line: 21, message: 'value "x" must be a positive number' });
    expect(problems[20]).toEqual({ line: null, message: '7 more problems not listed' });
  });

  it('is empty for any other failure', () => {
    expect(csvProblemsOf({ status: 400, field: 'file', message: 'file is required: send the CSV as multipart field "file" or as a text/csv body.' })).toEqual([]);
    expect(csvProblemsOf({ status: 413, field: undefined, message: 'The upload is too large.' })).toEqual([]);
    expect(csvProblemsOf({ status: 403, field: undefined, message: 'The CSV was not imported: nope.' })).toEqual([]);
  });
});
