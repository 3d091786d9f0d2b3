import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatSortHarness } from '@angular/material/sort/testing';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Member, Role } from '@tumblewise/shared';
import { Confirmation } from '@tumblewise/ui';
import { of } from 'rxjs';
import { Members } from './members';

const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const MEMBERS_URL = `/api/v1/workspaces/${WORKSPACE.id}/members`;

function member(n: number, name: string, email: string, role: Role, joinedAt: string): Member {
  const id = `00000000-0000-4000-8000-00000000000${n}`;
  return { id, userId: `10000000-0000-4000-8000-00000000000${n}`, name, email, role, joinedAt };
}

// Invented team.
const TEAM: Member[] = [
  member(1, 'Mira Okafor', 'mira.okafor@example.test', 'owner', '2026-11-02T09:00:00.000Z'),
  member(2, 'Teo Vance', 'teo.vance@example.test', 'designer', '2026-11-10T09:00:00.000Z'),
  member(3, 'Ana Brightwater', 'ana.b@example.test', 'reviewer', '2026-11-05T09:00:00.000Z'),
  member(4, 'Kofi Lund', 'kofi.lund@example.test', 'admin', '2026-11-20T09:00:00.000Z'),
];

describe('Members', () => {
  let fixture: ComponentFixture<Members>;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let loader: HarnessLoader;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Members],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: Confirmation, useValue: { ask: () => of(true) } },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: { id: TEAM[0].userId, email: TEAM[0].email, name: TEAM[0].name, isOperator: false, createdAt: WORKSPACE.createdAt },
      memberships: [{ workspace: WORKSPACE, role: 'owner' }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(Members);
    host = fixture.nativeElement;
    loader = TestbedHarnessEnvironment.loader(fixture);
    fixture.detectChanges();
    backend.expectOne(MEMBERS_URL).flush(TEAM);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  function names(): string[] {
    return Array.from(host.querySelectorAll('[data-testid="member-row"] td:first-child')).map((cell) =>
      cell.textContent!.replace('(you)', '').trim(),
    );
  }

  async function filterBy(text: string): Promise<void> {
    const input = host.querySelector<HTMLInputElement>('[data-testid="members-filter"]')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  it('lists the members sorted by name', () => {
    expect(names()).toEqual(['Ana Brightwater', 'Kofi Lund', 'Mira Okafor', 'Teo Vance']);
  });

  it('filters by name, e-mail or role, ignoring case', async () => {
    await filterBy('VANCE');
    expect(names()).toEqual(['Teo Vance']);
    await filterBy('kofi.lund@');
    expect(names()).toEqual(['Kofi Lund']);
    await filterBy('reviewer');
    expect(names()).toEqual(['Ana Brightwater']);
    await filterBy('');
    expect(names()).toHaveLength(4);
  });

  it('says when nothing matches the filter', async () => {
    await filterBy('nobody-like-this');
    expect(names()).toEqual([]);
    expect(host.textContent).toContain('No member matches "nobody-like-this".');
  });

  it('sorts by e-mail, role rank and joining date', async () => {
    const sort = await loader.getHarness(MatSortHarness);
    const [, email, role, joined] = await sort.getSortHeaders();

    await email.click();
    expect(names()).toEqual(['Ana Brightwater', 'Kofi Lund', 'Mira Okafor', 'Teo Vance']);
    await email.click();
    expect(names()).toEqual(['Teo Vance', 'Mira Okafor', 'Kofi Lund', 'Ana Brightwater']);

    await role.click();
    expect(names()).toEqual(['Mira Okafor', 'Kofi Lund', 'Teo Vance', 'Ana Brightwater']);

    await joined.click();
    expect(names()).toEqual(['Mira Okafor', 'Ana Brightwater', 'Teo Vance', 'Kofi Lund']);
  });

  it('saves a role change', async () => {
    const selects = await loader.getAllHarnesses(MatSelectHarness.with({ selector: '[data-testid="member-role"]' }));
    // Rows in name order: Ana, Kofi, Mira, Teo.
    await selects[3].open();
    await selects[3].clickOptions({ text: 'Admin' });
    const call = backend.expectOne(`${MEMBERS_URL}/${TEAM[1].id}`);
    expect(call.request.method).toBe('PATCH');
    expect(call.request.body).toEqual({ role: 'admin' });
    call.flush({ ...TEAM[1], role: 'admin' });
    await fixture.whenStable();
    expect(await selects[3].getValueText()).toBe('Admin');
  });

  it("shows the server's refusal to demote the last owner and keeps the old role", async () => {
    const selects = await loader.getAllHarnesses(MatSelectHarness.with({ selector: '[data-testid="member-role"]' }));
    await selects[2].open();
    await selects[2].clickOptions({ text: 'Designer' });
    backend
      .expectOne(`${MEMBERS_URL}/${TEAM[0].id}`)
      .flush({ error: { code: 'last_owner', message: 'A workspace needs at least one owner.' } }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="error-banner"]')?.textContent).toContain('A workspace needs at least one owner.');
    const after = await loader.getAllHarnesses(MatSelectHarness.with({ selector: '[data-testid="member-role"]' }));
    expect(await after[2].getValueText()).toBe('Owner');
  });

  it('reloads my own memberships after I change my own role', async () => {
    const selects = await loader.getAllHarnesses(MatSelectHarness.with({ selector: '[data-testid="member-role"]' }));
    await selects[2].open(); // Mira, the signed-in owner
    await selects[2].clickOptions({ text: 'Admin' });
    backend.expectOne(`${MEMBERS_URL}/${TEAM[0].id}`).flush({ ...TEAM[0], role: 'admin' });
    const me = backend.expectOne('/api/v1/me');
    me.flush({
      user: { id: TEAM[0].userId, email: TEAM[0].email, name: TEAM[0].name, isOperator: false, createdAt: WORKSPACE.createdAt },
      memberships: [{ workspace: WORKSPACE, role: 'admin' }],
    });
    await fixture.whenStable();
    expect(TestBed.inject(AuthState).memberships()[0].role).toBe('admin');
  });

  it("keeps the last owner's row when the server refuses the removal", async () => {
    const removeButtons = host.querySelectorAll<HTMLButtonElement>('[data-testid="member-remove"]');
    removeButtons[2].click(); // Mira, the owner
    await fixture.whenStable();
    const call = backend.expectOne(`${MEMBERS_URL}/${TEAM[0].id}`);
    expect(call.request.method).toBe('DELETE');
    call.flush({ error: { code: 'last_owner', message: 'The last owner cannot be removed.' } }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="error-banner"]')?.textContent).toContain('The last owner cannot be removed.');
    expect(names()).toContain('Mira Okafor');
  });

  it('drops a removed member from the table', async () => {
    host.querySelectorAll<HTMLButtonElement>('[data-testid="member-remove"]')[0].click(); // Ana
    await fixture.whenStable();
    backend.expectOne(`${MEMBERS_URL}/${TEAM[2].id}`).flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(names()).toEqual(['Kofi Lund', 'Mira Okafor', 'Teo Vance']);
  });
});

describe('Members as an admin', () => {
  it('cannot change or remove an owner, and cannot make anyone owner', async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Members],
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-admin',
      expiresIn: 900,
      user: { id: TEAM[3].userId, email: TEAM[3].email, name: TEAM[3].name, isOperator: false, createdAt: WORKSPACE.createdAt },
      memberships: [{ workspace: WORKSPACE, role: 'admin' }],
    });
    const fixture = TestBed.createComponent(Members);
    const loader = TestbedHarnessEnvironment.loader(fixture);
    fixture.detectChanges();
    TestBed.inject(HttpTestingController).expectOne(MEMBERS_URL).flush(TEAM);
    await fixture.whenStable();

    const host: HTMLElement = fixture.nativeElement;
    expect(host.querySelectorAll('[data-testid="member-role"]')).toHaveLength(3);
    expect(host.querySelector('[data-testid="member-role-text"]')?.textContent).toBe('Owner');
    expect(host.querySelectorAll('[data-testid="member-remove"]')).toHaveLength(3);

    const [first] = await loader.getAllHarnesses(MatSelectHarness.with({ selector: '[data-testid="member-role"]' }));
    await first.open();
    const options = await first.getOptions();
    expect(await Promise.all(options.map((o) => o.getText()))).toEqual(['Admin', 'Designer', 'Reviewer']);
  });
});
