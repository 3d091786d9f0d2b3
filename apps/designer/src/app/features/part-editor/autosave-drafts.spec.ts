import { HttpErrorResponse } from '@angular/common/http';
import { ApiError } from '@tumblewise/api-client';
import type { Part } from '@tumblewise/shared';
import { Observable, throwError } from 'rxjs';
import { TestScheduler } from 'rxjs/testing';
import { autosaveDrafts, type DraftSaveOutcome } from './autosave-drafts';
import type { DraftDocument } from './draft-document';

const doc = (name: string): DraftDocument => ({ name, primitives: [], spin: { axis: [0, 0, 1], rate: 1 } });

describe('autosaveDrafts', () => {
  let scheduler: TestScheduler;
  beforeEach(() => (scheduler = new TestScheduler((actual, expected) => expect(actual).toEqual(expected))));

  it('saves once after a pause, one save at a time', () => {
    scheduler.run(({ hot, cold, expectObservable }) => {
      const saved: string[] = [];
      const save = (d: DraftDocument): Observable<Part> => {
        saved.push(d.name!);
        return cold('---p|', { p: { draftVersion: saved.length } as Part });
      };
      const out = autosaveDrafts(hot('ab---------c', { a: doc('a'), b: doc('b'), c: doc('c') }), save, 5, scheduler);
      expectObservable(out.pipe(kind())).toBe('---------s---------s', { s: 'saved' });
      scheduler.flush();
      expect(saved).toEqual(['b', 'c']);
    });
  });

  it('reports a 409 as a conflict and keeps the document it could not save', () => {
    scheduler.run(({ hot, expectObservable }) => {
      const stale = ApiError.fromHttpError(
        new HttpErrorResponse({
          status: 409,
          error: { error: { code: 'stale_version', message: 'Someone saved this part after you loaded it.', field: 'draftVersion' } },
        }),
      );
      const out = autosaveDrafts(hot('a', { a: doc('mine') }), () => throwError(() => stale), 1, scheduler);
      expectObservable(out.pipe(kind((o) => (o.kind === 'conflict' ? `${o.kind}:${o.document.name}:${o.error.code}` : o.kind)))).toBe(
        '-c',
        { c: 'conflict:mine:stale_version' },
      );
    });
  });
});

function kind(f: (o: DraftSaveOutcome) => string = (o) => o.kind) {
  return (source: Observable<DraftSaveOutcome>) =>
    new Observable<string>((sub) => source.subscribe({ next: (o) => sub.next(f(o)), complete: () => sub.complete() }));
}
