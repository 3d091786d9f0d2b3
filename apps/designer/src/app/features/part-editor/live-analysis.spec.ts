import { HttpErrorResponse } from '@angular/common/http';
import { ApiError } from '@tumblewise/api-client';
import type { SpinReport } from '@tumblewise/engine';
import { Observable, throwError } from 'rxjs';
import { TestScheduler } from 'rxjs/testing';
import { analysisRequest } from './document-issues';
import type { DraftDocument } from './draft-document';
import { ANALYSIS_DEBOUNCE_MS, liveAnalysis, type LiveAnalysis } from './live-analysis';

const doc = (radius: number | null): DraftDocument => ({
  primitives: [{ id: 'grip', shape: 'cylinder', radius, length: 0.19, density: 650 }],
  spin: { axis: [0, 0, 1], rate: 31.4, misalignmentDeg: 1 },
});
const reportFor = (d: DraftDocument) => ({ mass: d.primitives[0]['radius'] as number }) as unknown as SpinReport;
const prepare = (d: DraftDocument) => analysisRequest(d, new Map());

describe('liveAnalysis', () => {
  let scheduler: TestScheduler;
  beforeEach(() => {
    scheduler = new TestScheduler((actual, expected) => expect(actual).toEqual(expected));
  });

  const shape = (a: LiveAnalysis) => `${a.status}:${a.report ? (a.report as unknown as { mass: number }).mass : '-'}`;

  it('waits for a pause in typing and sends only the last document', () => {
    scheduler.run(({ cold, hot, expectObservable }) => {
      const sent: number[] = [];
      const analyze = (d: DraftDocument): Observable<SpinReport> => {
        sent.push(d.primitives[0]['radius'] as number);
        return cold('--r|', { r: reportFor(d) });
      };
      // Keystrokes 1, 2, 3 ms apart, then quiet: one request after 10 ms of quiet.
      const docs = hot('a-b-c', { a: doc(0.01), b: doc(0.013), c: doc(0.0135) });
      const out = liveAnalysis(docs, prepare, analyze, 10, scheduler);
      expectObservable(out.pipe(mapShape(shape))).toBe('--------------l-r', { l: 'loading:-', r: 'ready:0.0135' });
      scheduler.flush();
      expect(sent).toEqual([0.0135]);
    });
  });

  it('by default waits ANALYSIS_DEBOUNCE_MS of quiet, restarted by every keystroke', () => {
    scheduler.run(({ cold, hot, expectObservable }) => {
      const analyze = (d: DraftDocument) => cold('-r|', { r: reportFor(d) });
      // Two keystrokes 5 ms apart: the quiet time counts from the second one.
      const docs = hot('a 4ms b', { a: doc(0.01), b: doc(0.012) });
      const out = liveAnalysis(docs, prepare, analyze);
      expectObservable(out.pipe(mapShape(shape))).toBe(`${5 + ANALYSIS_DEBOUNCE_MS}ms l r`, { l: 'loading:-', r: 'ready:0.012' });
    });
  });

  it('drops the answer to a document that was changed while it was computed (switchMap)', () => {
    scheduler.run(({ cold, hot, expectObservable }) => {
      const analyze = (d: DraftDocument) => cold('-----r|', { r: reportFor(d) });
      // a is debounced at 2, its request would answer at 7; b arrives at 4 and cancels it.
      const docs = hot('a---b', { a: doc(0.01), b: doc(0.02) });
      const out = liveAnalysis(docs, prepare, analyze, 2, scheduler);
      expectObservable(out.pipe(mapShape(shape))).toBe('--l---l----r', { l: 'loading:-', r: 'ready:0.02' });
    });
  });

  it('keeps the last report while the next one loads', () => {
    scheduler.run(({ cold, hot, expectObservable }) => {
      const analyze = (d: DraftDocument) => cold('-r|', { r: reportFor(d) });
      const docs = hot('a-----b', { a: doc(0.01), b: doc(0.02) });
      const out = liveAnalysis(docs, prepare, analyze, 1, scheduler);
      // While b loads, the report of a stays on screen.
      expectObservable(out.pipe(mapShape(shape))).toBe('-lr----LR', {
        l: 'loading:-',
        r: 'ready:0.01',
        L: 'loading:0.01',
        R: 'ready:0.02',
      });
    });
  });

  it('does not send a document the shared schema refuses, and names the field', () => {
    scheduler.run(({ hot, expectObservable }) => {
      const analyze = jest.fn();
      const docs = hot('a', { a: doc(-0.002) });
      const out = liveAnalysis(docs, prepare, analyze, 1, scheduler);
      expectObservable(out.pipe(mapShape((a) => `${a.status} ${JSON.stringify(a.issues)}`))).toBe('-i', {
        i: 'invalid {"primitives[0].radius":"must be greater than zero"}',
      });
      scheduler.flush();
      expect(analyze).not.toHaveBeenCalled();
    });
  });

  it('maps a server error naming a field to that field', () => {
    scheduler.run(({ hot, expectObservable }) => {
      const refusal = ApiError.fromHttpError(
        new HttpErrorResponse({
          status: 422,
          error: {
            error: {
              code: 'unanalysable',
              message: 'Primitives[0].density removes more mass than there is.',
              field: 'primitives[0].density',
            },
          },
        }),
      );
      const analyze = () => throwError(() => refusal);
      const docs = hot('a', { a: doc(0.01) });
      const out = liveAnalysis(docs, prepare, analyze, 1, scheduler);
      expectObservable(out.pipe(mapShape((a) => `${a.status} ${JSON.stringify(a.issues)} ${a.error?.code ?? ''}`))).toBe('-(le)', {
        l: 'loading {} ',
        e: 'error {"primitives[0].density":"removes more mass than there is"} unanalysable',
      });
    });
  });

  it('goes idle with no primitives', () => {
    scheduler.run(({ hot, expectObservable }) => {
      const docs = hot('a', { a: { ...doc(0.01), primitives: [] } });
      expectObservable(liveAnalysis(docs, prepare, jest.fn(), 1, scheduler).pipe(mapShape(shape))).toBe('-i', { i: 'idle:-' });
    });
  });
});

function mapShape<T>(f: (a: LiveAnalysis) => T) {
  return (source: Observable<LiveAnalysis>) =>
    new Observable<T>((sub) =>
      source.subscribe({ next: (a) => sub.next(f(a)), error: (e) => sub.error(e), complete: () => sub.complete() }),
    );
}
