import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { SolveAnswer, SolveRequest, SweepAnswer, SweepRequest } from '@tumblewise/shared';
import { ApiError } from '../errors/api-error';
import { errorInterceptor } from '../errors/error-interceptor';
import { DesignApi } from './design-api';

// An invented practice board (SI): 30 × 20 × 700 mm at 600 kg/m³, butt at z = 0.
const PART = {
  name: 'Harbour practice board',
  primitives: [
    {
      id: 'board',
      shape: 'box' as const,
      size: [0.03, 0.02, 0.7] as [number, number, number],
      position: [0, 0, 0.35] as [number, number, number],
      density: 600,
    },
  ],
  spin: { axis: [0, 1, 0] as [number, number, number], rate: 10 },
  grip: {
    point: [0, 0, 0] as [number, number, number],
    axis: [0, 0, 1] as [number, number, number],
    faceNormal: [0, 1, 0] as [number, number, number],
  },
};
const SOLVE: SolveRequest = {
  part: PART,
  free: [{ primitive: 'board', parameter: 'size.2', min: 0.5, max: 1 }],
  targets: [
    { figure: 'mass', value: 0.3 },
    { figure: 'balancePoint', max: 0.45 },
  ],
};
const ANSWER: SolveAnswer = {
  status: 'met',
  part: PART,
  report: {},
  achieved: [{ figure: 'mass', value: 0.3, target: { value: 0.3 }, met: true }],
  changes: [{ primitive: 'board', parameter: 'size.2', from: 0.7, to: 0.8333 }],
};

describe('DesignApi', () => {
  let api: DesignApi;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()] });
    api = TestBed.inject(DesignApi);
    backend = TestBed.inject(HttpTestingController);
  });
  afterEach(() => backend.verify());

  it('posts the goal seek body unchanged to /solve with the workspace as a query parameter', () => {
    let answer: SolveAnswer | null = null;
    api.solve(SOLVE, 'ws-1').subscribe((a) => (answer = a));
    const call = backend.expectOne((r) => r.url === '/api/v1/solve');
    expect(call.request.method).toBe('POST');
    expect(call.request.params.get('workspace')).toBe('ws-1');
    expect(call.request.urlWithParams).toBe('/api/v1/solve?workspace=ws-1');
    expect(call.request.body).toEqual(SOLVE);
    call.flush(ANSWER);
    expect(answer).toEqual(ANSWER);
  });

  it('sends no workspace parameter when none is given', () => {
    api.solve(SOLVE).subscribe();
    const call = backend.expectOne('/api/v1/solve');
    expect(call.request.params.keys()).toEqual([]);
    call.flush(ANSWER);
  });

  it('hands a 400 on as an ApiError naming the field', () => {
    let failure: unknown = null;
    api.solve({ ...SOLVE, free: [{ primitive: 'board', parameter: 'size.2', min: 1, max: 0.5 }] }, 'ws-1').subscribe({
      error: (e: unknown) => (failure = e),
    });
    backend
      .expectOne('/api/v1/solve?workspace=ws-1')
      .flush(
        { error: { code: 'invalid', message: 'free[0].max must be greater than min', field: 'free[0].max' } },
        { status: 400, statusText: 'Bad Request' },
      );
    expect(failure).toBeInstanceOf(ApiError);
    expect(failure).toMatchObject({ status: 400, field: 'free[0].max', message: 'free[0].max must be greater than min' });
  });

  it('posts a sweep body to /sweep with the workspace', () => {
    const body: SweepRequest = {
      part: PART,
      axes: [{ primitive: 'board', parameter: 'density', from: 500, to: 700, steps: 3 }],
      figures: ['mass'],
    };
    const answer: SweepAnswer = {
      axes: [{ primitive: 'board', parameter: 'density', values: [500, 600, 700] }],
      figures: ['mass'],
      points: [],
    };
    let got: SweepAnswer | null = null;
    api.sweep(body, 'ws-2').subscribe((a) => (got = a));
    const call = backend.expectOne('/api/v1/sweep?workspace=ws-2');
    expect(call.request.method).toBe('POST');
    expect(call.request.body).toEqual(body);
    call.flush(answer);
    expect(got).toEqual(answer);
  });
});
