import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, TestRequest } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatPaginatorHarness } from '@angular/material/paginator/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { AuditEvent } from '@tumblewise/shared';
import { Audit } from './audit';

const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;

function events(count: number, offset = 0): AuditEvent[] {
  return Array.from({ length: count }, (_, i) => ({
    id: `30000000-0000-4000-8000-${String(offset + i).padStart(12, '0')}`,
    at: '2026-11-20T09:00:00.000Z',
    action: 'invitation.created',
    actor: { id: '10000000-0000-4000-8000-000000000001', name: 'Mira Okafor', email: 'mira.okafor@example.test' },
    targetType: 'invitation',
    targetId: null,
    targetLabel: `guest${offset + i}@example.test`,
    details: { role: 'designer' },
  }));
}

describe('Audit', () => {
  let fixture: ComponentFixture<Audit>;
  let backend: HttpTestingController;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Audit],
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: WORKSPACE.createdAt,
      },
      memberships: [{ workspace: WORKSPACE, role: 'owner' }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(Audit);
    fixture.detectChanges();
    backend.expectOne(`${BASE}/members`).flush([]);
    const first = auditCall();
    expect(first.request.params.get('page')).toBe('1');
    expect(first.request.params.get('pageSize')).toBe('25');
    first.flush({ items: events(25), total: 60, page: 1, pageSize: 25 });
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  function auditCall(): TestRequest {
    return backend.expectOne((r) => r.url === `${BASE}/audit`);
  }

  /** Clicks "next page" directly: a harness would wait for stability, which the pending request prevents. */
  function clickNextPage(): void {
    fixture.nativeElement.querySelector('.mat-mdc-paginator-navigation-next').click();
    fixture.detectChanges();
  }

  function rows(): number {
    return fixture.nativeElement.querySelectorAll('[data-testid="audit-row"]').length;
  }

  it('asks the server for the next page', async () => {
    expect(rows()).toBe(25);
    const paginator = await TestbedHarnessEnvironment.loader(fixture).getHarness(MatPaginatorHarness);
    expect(await paginator.getRangeLabel()).toBe('1 – 25 of 60');
    clickNextPage();
    const call = auditCall();
    expect(call.request.params.get('page')).toBe('2');
    call.flush({ items: events(25, 25), total: 60, page: 2, pageSize: 25 });
    await fixture.whenStable();
    expect(await paginator.getRangeLabel()).toBe('26 – 50 of 60');
  });

  it('filters by action on the server and starts again at page 1', async () => {
    const loader = TestbedHarnessEnvironment.loader(fixture);
    clickNextPage();
    auditCall().flush({ items: events(25, 25), total: 60, page: 2, pageSize: 25 });
    await fixture.whenStable();

    const action = await loader.getHarness(MatSelectHarness.with({ selector: '[data-testid="audit-action"]' }));
    await action.open();
    await action.clickOptions({ text: 'Member removed' });
    await new Promise((resolve) => setTimeout(resolve, 300)); // the filter waits 250 ms for typing to settle
    fixture.detectChanges();
    const call = auditCall();
    expect(call.request.params.get('action')).toBe('member.removed');
    expect(call.request.params.get('page')).toBe('1');
    call.flush({ items: [], total: 0, page: 1, pageSize: 25 });
    await fixture.whenStable();
    expect(fixture.nativeElement.textContent).toContain('Nothing matches these filters.');
  });
});
