import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { Router, provideRouter, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { Confirmation, type ConfirmRequest } from '@tumblewise/ui';
import { of } from 'rxjs';
import type { Measurement, Part, Project, Role, Variant, WorkspaceSettings } from '@tumblewise/shared';
import { MeasuredData } from './measured-data';

// Invented workspace, part, variants and rig readings.
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const PROJECT_ID = '40000000-0000-4000-8000-000000000001';
const PART_ID = '50000000-0000-4000-8000-000000000001';
const PROJECT: Project = {
  id: PROJECT_ID,
  name: 'Practice batons',
  category: 'juggling',
  notes: '',
  archived: false,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
};
const PART = {
  id: PART_ID,
  projectId: PROJECT_ID,
  name: 'Practice baton',
  draft: null,
  draftVersion: 1,
  latestVariant: null,
  variantCount: 2,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
} as Part;
const variant = (n: number, label: string): Variant => ({
  id: `60000000-0000-4000-8000-00000000000${n}`,
  partId: PART_ID,
  number: n,
  label,
  notes: '',
  document: {},
  report: {},
  engineVersion: 'test',
  status: 'draft',
  author: null,
  version: 1,
  createdAt: WORKSPACE.createdAt,
  updatedAt: WORKSPACE.createdAt,
});
const V1 = variant(1, 'first cut');
const V2 = variant(2, 'heavier knob');
const SETTINGS: WorkspaceSettings = {
  id: WORKSPACE.id,
  name: WORKSPACE.name,
  displayUnits: { length: 'mm', mass: 'g', inertia: 'kg·cm²' },
  defaultTolerances: { density: 0.05, size: 0.0002 },
};
const IMPORT_A = '80000000-0000-4000-8000-00000000000a';
const IMPORT_B = '80000000-0000-4000-8000-00000000000b';
// 0.0024 kg·m² = 24 kg·cm² (SI prefixes); the difference is the server's, (measured − predicted) / predicted.
const MAJOR: Measurement = {
  id: '70000000-0000-4000-8000-000000000001',
  axis: 'major',
  value: 0.002472,
  enteredValue: 24720,
  enteredUnit: 'g·cm²',
  method: 'compound pendulum',
  predicted: 0.0024,
  differencePercent: 3,
  importId: IMPORT_A,
  createdAt: '2026-11-30T10:00:00.000Z',
};
const SWING: Measurement = {
  id: '70000000-0000-4000-8000-000000000002',
  axis: 'swing',
  value: 0.0186,
  enteredValue: 186,
  enteredUnit: 'kg·cm²',
  method: 'swing rig',
  predicted: 0.02,
  differencePercent: -7,
  importId: null,
  createdAt: '2026-11-30T10:01:00.000Z',
};
const OTHER: Measurement = {
  id: '70000000-0000-4000-8000-000000000003',
  axis: 'end-over-end (rig B)',
  value: 0.0123,
  enteredValue: 0.0123,
  enteredUnit: 'kg·m²',
  method: 'trifilar pendulum',
  predicted: null,
  differencePercent: null,
  importId: IMPORT_B,
  createdAt: '2026-11-30T11:00:00.000Z',
};

/** Runs effects and lets pending microtasks and timers settle; unlike whenStable it does not wait for open requests. */
async function settle(): Promise<void> {
  TestBed.tick();
  await new Promise((r) => setTimeout(r, 0));
  TestBed.tick();
}

describe('MeasuredData', () => {
  let harness: RouterTestingHarness;
  let backend: HttpTestingController;
  let host: HTMLElement;
  /** What the confirm dialog was asked, and what the user answers. */
  let asked: ConfirmRequest[];
  let answer: boolean;

  async function open(
    role: Role = 'designer',
    query = `?variant=${V1.id}`,
    readings: Measurement[] = [MAJOR, SWING],
    readFor = V1,
  ): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'projects/:projectId/parts/:partId/measurements', component: MeasuredData }], withComponentInputBinding()),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
        { provide: Confirmation, useValue: { ask: (r: ConfirmRequest) => (asked.push(r), of(answer)) } },
      ],
    });
    asked = [];
    answer = true;
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [{ workspace: WORKSPACE, role }],
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: WORKSPACE.createdAt,
      },
    });
    backend = TestBed.inject(HttpTestingController);
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/measurements${query}`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(PART);
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2]);
    backend.expectOne(`${BASE}/settings`).flush(SETTINGS);
    await settle();
    backend.expectOne(`${BASE}/variants/${readFor.id}/measurements`).flush(readings);
    await harness.fixture.whenStable();
    host = harness.routeNativeElement!;
  }

  afterEach(() => backend.verify());

  const testId = (id: string, within: ParentNode = host) => within.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const all = (id: string) => Array.from(host.querySelectorAll<HTMLElement>(`[data-testid="${id}"]`));
  const text = (el: Element | null) => (el?.textContent ?? '').replace(/\s+/g, ' ').trim();
  const row = (axis: string) => host.querySelector<HTMLElement>(`[data-testid="measurement-row"][data-axis="${axis}"]`)!;
  const pick = async (file: File) => {
    const input = testId('measurements-file') as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [file], configurable: true });
    input.dispatchEvent(new Event('change'));
    await settle();
  };
  const csv = (body: string, name = 'rig.csv') => new File([body], name, { type: 'text/csv' });

  it('shows each reading as entered and in the workspace unit, the prediction, and the signed difference flagged beyond 5 %', async () => {
    await open();
    expect(all('measurement-row')).toHaveLength(2);
    const major = row('major');
    expect(text(testId('measurement-entered', major))).toBe('24,720 g·cm²');
    expect(text(testId('measurement-value', major))).toBe('24.72 kg·cm²');
    expect(text(testId('measurement-predicted', major))).toBe('24 kg·cm²');
    expect(testId('measurement-difference', major)!.getAttribute('data-state')).toBe('near');
    expect(text(testId('measurement-difference', major))).toContain('+3.0 %');
    expect(text(testId('measurement-difference', major))).toContain('within 5 % of the prediction');
    expect(text(major)).toContain('against the largest principal moment I1');
    const swing = row('swing');
    expect(testId('measurement-difference', swing)!.getAttribute('data-state')).toBe('far');
    expect(text(testId('measurement-difference', swing))).toContain('−7.0 %');
    expect(text(testId('measurement-difference', swing))).toContain('below the prediction by more than 5 %');
    expect(swing.querySelector('.tw-diff-far .material-icons')!.textContent).toBe('warning');
    expect(text(testId('measurements-summary'))).toContain('2 readings, 1 beyond 5 %');
    // Table semantics: a caption, column headers and a row header per reading.
    const table = testId('measurements-table')!;
    expect(table.querySelector('caption')!.textContent).toContain('v1 first cut');
    expect(Array.from(table.querySelectorAll('thead th[scope="col"]')).map(text)).toEqual([
      'Axis',
      'Measured, as entered',
      'Measured (kg·cm²)',
      'Predicted (kg·cm²)',
      'Difference',
      'Method',
      'Recorded',
      'Remove',
    ]);
    expect(testId('measurement-remove', major)!.getAttribute('aria-label')).toBe('Remove the reading major, 24,720 g·cm²');
    expect(major.querySelector('th[scope="row"]')).not.toBeNull();
    expect(text(testId('measurements-estimates'))).toContain('Measured and predicted values are both estimates');
    const crumbs = host.querySelector('nav[aria-label="Breadcrumb"]')!;
    expect(Array.from(crumbs.querySelectorAll('a, [aria-current]')).map(text)).toEqual([
      'Projects',
      'Practice batons',
      'Practice baton',
      'Measured data',
    ]);
    expect(crumbs.querySelector('[aria-current="page"]')!.textContent).toBe('Measured data');
  });

  it('defaults to the newest variant and writes it into the address; the picker switches and keeps the address in step', async () => {
    await open('designer', '', [OTHER], V2);
    const router = TestBed.inject(Router);
    expect(router.url).toContain(`variant=${V2.id}`);
    const select = testId('measurements-variant') as HTMLSelectElement;
    expect(select.value).toBe(V2.id);
    expect(text(testId('measurement-difference', row(OTHER.axis)))).toContain('no prediction for this axis');
    select.value = V1.id;
    select.dispatchEvent(new Event('change'));
    await settle();
    backend.expectOne(`${BASE}/variants/${V1.id}/measurements`).flush([MAJOR]);
    await harness.fixture.whenStable();
    expect(router.url).toContain(`variant=${V1.id}`);
    expect(all('measurement-row').map((r) => r.getAttribute('data-axis'))).toEqual(['major']);
  });

  it('explains the CSV format when there is nothing yet and offers a template made in the browser', async () => {
    await open('designer', `?variant=${V1.id}`, []);
    const empty = testId('measurements-empty')!;
    expect(text(empty)).toContain('No measured data for this variant yet');
    expect(testId('measurements-example', empty)!.textContent).toContain('axis,value,unit,method');
    const saved: Blob[] = [];
    const createObjectURL = jest.fn((b: Blob) => (saved.push(b), 'blob:template'));
    Object.assign(URL, { createObjectURL, revokeObjectURL: jest.fn() });
    const clicked = jest.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      expect(this.download).toBe('Practice-baton-v1-measurements.csv');
    });
    testId('measurements-template-inline', empty)!.click();
    expect(clicked).toHaveBeenCalledTimes(1);
    clicked.mockRestore();
    const body = await new Promise<string>((resolve) => {
      const reader = new FileReader();
      reader.onload = () => resolve(reader.result as string);
      reader.readAsText(saved[0]);
    });
    expect(body.split('\r\n')[0]).toBe('axis,value,unit,method');
    expect(body).toContain('major,,kg·cm²,compound pendulum');
  });

  it('lists a refused file’s problems by line, says nothing was imported and leaves the table as it was', async () => {
    await open();
    await pick(csv('axis,value,unit,method\nminor,-3,kg·m²,pendulum\n,0.2,furlongs,\n', 'bad.csv'));
    const post = backend.expectOne(`${BASE}/variants/${V1.id}/measurements`);
    expect(post.request.method).toBe('POST');
    expect(((post.request.body as FormData).get('file') as File).name).toBe('bad.csv');
    harness.fixture.detectChanges();
    expect(text(testId('measurements-status'))).toContain('Importing…');
    expect(testId('measurements-progress')).not.toBeNull();
    expect((testId('measurements-choose') as HTMLButtonElement).disabled).toBe(true);
    // The problems as the server sends them (server/src/measurements/measurement-csv.ts); the message is not read.
    post.flush(
      {
        error: {
          code: 'invalid_input',
          field: 'file',
          message: 'The CSV was not imported: (see problems).',
          problems: [
            { line: 2, message: 'value "-3" must be a positive number' },
            { line: 3, message: 'axis must be 1–120 characters' },
            { line: 3, message: 'unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)' },
            { line: null, message: '2 more problems are not listed' },
          ],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await harness.fixture.whenStable();
    const problems = testId('measurements-problems')!;
    expect(problems.getAttribute('role')).toBe('alert');
    expect(text(problems)).toContain('Nothing was imported.');
    expect(all('measurements-problem').map((li) => [li.getAttribute('data-line'), text(li)])).toEqual([
      ['2', 'Line 2: value "-3" must be a positive number'],
      ['3', 'Line 3: axis must be 1–120 characters'],
      ['3', 'Line 3: unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)'],
      [null, '2 more problems are not listed'],
    ]);
    expect(all('measurement-row')).toHaveLength(2);
    expect(text(testId('measurements-status'))).toBe('');
    backend.expectNone(`${BASE}/variants/${V1.id}/measurements`);
  });

  it('imports a good file, says how many rows came in, and reloads the table with them marked', async () => {
    await open();
    await pick(csv('axis,value,unit,method\nend-over-end (rig B),0.0123,kg·m²,trifilar pendulum\n', 'rig-b.csv'));
    backend
      .expectOne((r) => r.method === 'POST' && r.url === `${BASE}/variants/${V1.id}/measurements`)
      .flush([OTHER], { status: 201, statusText: 'Created' });
    await settle();
    backend.expectOne((r) => r.method === 'GET' && r.url === `${BASE}/variants/${V1.id}/measurements`).flush([MAJOR, SWING, OTHER]);
    await harness.fixture.whenStable();
    expect(text(testId('measurements-status'))).toContain('Imported 1 reading from rig-b.csv');
    expect(all('measurement-row')).toHaveLength(3);
    expect(row(OTHER.axis).getAttribute('data-fresh')).toBe('true');
    expect(row('major').getAttribute('data-fresh')).toBeNull();
    expect(testId('measurements-problems')).toBeNull();
  });

  it('refuses a file that is not a CSV without sending it, and a failure of another kind in a banner', async () => {
    await open();
    await pick(new File(['{}'], 'frame.json', { type: 'application/json' }));
    expect(text(testId('error-banner'))).toContain('“frame.json” is not a CSV file');
    backend.expectNone(`${BASE}/variants/${V1.id}/measurements`);
    await pick(csv('axis,value,unit,method\nmajor,1,kg·m²,rig\n'));
    backend
      .expectOne((r) => r.method === 'POST')
      .flush(
        { error: { code: 'forbidden', message: 'Your role in this workspace does not allow this.' } },
        { status: 403, statusText: 'Forbidden' },
      );
    await harness.fixture.whenStable();
    expect(text(testId('error-banner')!.querySelector('p'))).toBe(
      '“rig.csv” was not imported: Your role in this workspace does not allow this.',
    );
    expect(testId('measurements-problems')).toBeNull();
  });

  it('removes one reading after confirming, reloads the table and says what went', async () => {
    await open();
    testId('measurement-remove', row('swing'))!.click();
    await settle();
    expect(asked).toHaveLength(1);
    expect(asked[0]).toMatchObject({ title: 'Remove this reading?', confirmLabel: 'Remove reading', destructive: true });
    expect(asked[0].message).toContain('“swing, 186 kg·cm²” (swing rig');
    const del = backend.expectOne(`${BASE}/variants/${V1.id}/measurements/${SWING.id}`);
    expect(del.request.method).toBe('DELETE');
    harness.fixture.detectChanges();
    expect(all('measurement-remove').every((b) => (b as HTMLButtonElement).disabled)).toBe(true);
    del.flush({ removed: 1 });
    await settle();
    backend.expectOne((r) => r.method === 'GET' && r.url === `${BASE}/variants/${V1.id}/measurements`).flush([MAJOR]);
    await harness.fixture.whenStable();
    expect(all('measurement-row').map((r) => r.getAttribute('data-axis'))).toEqual(['major']);
    expect(text(testId('measurements-removed'))).toBe('check_circle Removed the reading “swing, 186 kg·cm²”.');
    expect(document.activeElement?.id).toBe('tw-measured-heading');
  });

  it('sends nothing when the removal is not confirmed', async () => {
    await open();
    answer = false;
    testId('measurement-remove', row('major'))!.click();
    await settle();
    expect(asked).toHaveLength(1);
    backend.expectNone((r) => r.method === 'DELETE');
    expect(all('measurement-row')).toHaveLength(2);
    expect(text(testId('measurements-removed'))).toBe('');
  });

  it('says so when the reading was already gone, and shows what is left', async () => {
    await open();
    testId('measurement-remove', row('major'))!.click();
    await settle();
    backend
      .expectOne(`${BASE}/variants/${V1.id}/measurements/${MAJOR.id}`)
      .flush({ error: { code: 'not_found', message: 'Measurement was not found.' } }, { status: 404, statusText: 'Not Found' });
    await settle();
    backend.expectOne((r) => r.method === 'GET').flush([SWING]);
    await harness.fixture.whenStable();
    expect(text(testId('error-banner'))).toContain('Those readings were already removed');
    expect(all('measurement-row')).toHaveLength(1);
  });

  it('undoes an import after confirming how many rows it removes', async () => {
    await open();
    const second: Measurement = { ...OTHER, id: '70000000-0000-4000-8000-000000000004', axis: 'minor' };
    await pick(
      csv(
        'axis,value,unit,method\nend-over-end (rig B),0.0123,kg·m²,trifilar pendulum\nminor,0.0123,kg·m²,trifilar pendulum\n',
        'rig-b.csv',
      ),
    );
    backend.expectOne((r) => r.method === 'POST').flush([OTHER, second], { status: 201, statusText: 'Created' });
    await settle();
    backend.expectOne((r) => r.method === 'GET').flush([MAJOR, SWING, OTHER, second]);
    await harness.fixture.whenStable();
    const undo = testId('measurements-undo-import')!;
    expect(text(undo)).toBe('undo Undo this import');
    undo.click();
    await settle();
    expect(asked[0]).toMatchObject({ title: 'Undo the import of rig-b.csv?', confirmLabel: 'Remove 2 readings', destructive: true });
    expect(asked[0].message).toContain('The 2 readings it brought in are removed');
    const del = backend.expectOne(`${BASE}/variants/${V1.id}/measurements/imports/${IMPORT_B}`);
    expect(del.request.method).toBe('DELETE');
    del.flush({ removed: 2 });
    await settle();
    backend.expectOne((r) => r.method === 'GET').flush([MAJOR, SWING]);
    await harness.fixture.whenStable();
    expect(all('measurement-row')).toHaveLength(2);
    expect(text(testId('measurements-removed'))).toContain('Undid the import of rig-b.csv: removed 2 readings.');
    expect(testId('measurements-undo-import')).toBeNull();
    expect(text(testId('measurements-status'))).toBe('');
  });

  it('shows a reviewer the readings but no way to import', async () => {
    await open('reviewer');
    expect(all('measurement-row')).toHaveLength(2);
    expect(testId('measurements-import')).toBeNull();
    expect(testId('measurements-file')).toBeNull();
    expect(all('measurement-remove')).toHaveLength(0);
    expect(testId('measurements-removed')).toBeNull();
    expect(Array.from(testId('measurements-table')!.querySelectorAll('thead th')).map(text)).not.toContain('Remove');
    expect(text(testId('measurements-read-only'))).toContain('a designer, admin or owner imports it');
  });

  it('says so when the address names another part’s variant', async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'projects/:projectId/parts/:partId/measurements', component: MeasuredData }], withComponentInputBinding()),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      memberships: [{ workspace: WORKSPACE, role: 'designer' }],
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: WORKSPACE.createdAt,
      },
    });
    backend = TestBed.inject(HttpTestingController);
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/projects/${PROJECT_ID}/parts/${PART_ID}/measurements?variant=60000000-0000-4000-8000-0000000000ff`);
    TestBed.tick();
    backend.expectOne(`${BASE}/projects/${PROJECT_ID}`).flush(PROJECT);
    backend.expectOne(`${BASE}/parts/${PART_ID}`).flush(PART);
    backend.expectOne(`${BASE}/parts/${PART_ID}/variants`).flush([V1, V2]);
    backend
      .expectOne(`${BASE}/settings`)
      .flush({ error: { code: 'server_error', message: 'boom' } }, { status: 500, statusText: 'Server Error' });
    await harness.fixture.whenStable();
    host = harness.routeNativeElement!;
    expect(text(testId('measurements-unknown-variant'))).toContain('not one of this part');
    backend.expectNone(`${BASE}/variants/60000000-0000-4000-8000-0000000000ff/measurements`);
  });
});
