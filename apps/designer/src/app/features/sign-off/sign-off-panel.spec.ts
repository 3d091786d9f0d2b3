import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Member, ReviewThread, Role, VariantStatus } from '@tumblewise/shared';
import { SignOffPanel } from './sign-off-panel';

// Invented workspace and people.
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const VARIANT_ID = '60000000-0000-4000-8000-000000000007';
const BASE = `/api/v1/workspaces/${WORKSPACE.id}`;
const ME = { id: '10000000-0000-4000-8000-000000000001', name: 'Mira Okafor' };
const member = (n: number, name: string, role: Role, userId = `20000000-0000-4000-8000-00000000000${n}`): Member => ({
  id: `30000000-0000-4000-8000-00000000000${n}`,
  userId,
  name,
  email: `${name.split(' ')[0].toLowerCase()}@example.test`,
  role,
  joinedAt: WORKSPACE.createdAt,
});
const MEMBERS: Member[] = [
  member(1, 'Mira Okafor', 'designer', ME.id),
  member(2, 'Sol Varga', 'owner'),
  member(3, 'Juno Pell', 'admin'),
  member(4, 'Teo Brandt', 'designer'),
  member(5, 'Ada Quill', 'reviewer'),
];
const thread = (status: VariantStatus, entries: ReviewThread['entries'] = []): ReviewThread => ({ status, entries });
const REQUESTED = {
  id: '70000000-0000-4000-8000-000000000001',
  kind: 'requested' as const,
  author: ME,
  reviewer: { id: MEMBERS[4].userId, name: 'Ada Quill' },
  body: 'Please check the hoop mass.',
  createdAt: '2026-11-23T10:00:00.000Z',
};

describe('SignOffPanel', () => {
  let fixture: ComponentFixture<SignOffPanel>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  async function openAs(role: Role, status: VariantStatus, entries: ReviewThread['entries'] = []): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [SignOffPanel],
      providers: [
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
      ],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: { id: ME.id, email: 'mira@example.test', name: ME.name, isOperator: false, createdAt: WORKSPACE.createdAt },
      memberships: [{ workspace: WORKSPACE, role }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SignOffPanel);
    fixture.componentRef.setInput('variantId', VARIANT_ID);
    host = fixture.nativeElement;
    fixture.detectChanges();
    backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review`).flush(thread(status, entries));
    // Only those who may ask for a review load the member list.
    const members = backend.match(`${BASE}/members`);
    expect(members).toHaveLength(['owner', 'admin', 'designer'].includes(role) ? 1 : 0);
    members.forEach((r) => r.flush(MEMBERS));
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  const testId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const type = (id: string, value: string) => {
    const el = testId(id) as HTMLTextAreaElement;
    el.value = value;
    el.dispatchEvent(new Event('input'));
  };

  it('lets a designer ask for a review and comment, but not decide', async () => {
    await openAs('designer', 'draft');
    expect(testId('status-chip')!.textContent).toContain('Draft');
    expect(testId('review-request-form')).not.toBeNull();
    expect(testId('review-comment-form')).not.toBeNull();
    expect(testId('review-approve')).toBeNull();
    expect(testId('review-send-back')).toBeNull();
  });

  it('offers only members who may decide, never the requester', async () => {
    await openAs('designer', 'draft');
    testId('review-reviewer')!.click();
    await fixture.whenStable();
    const options = Array.from(document.querySelectorAll('mat-option')).map((o) => o.textContent!.trim());
    expect(options).toEqual(['Sol Varga (Owner)', 'Juno Pell (Admin)', 'Ada Quill (Reviewer)']);
  });

  it('posts the review request with the chosen reviewer and shows the new status', async () => {
    await openAs('designer', 'draft');
    const statuses: VariantStatus[] = [];
    fixture.componentInstance.statusChanged.subscribe((s) => statuses.push(s));
    testId('review-request-submit')!.click();
    await fixture.whenStable();
    // No reviewer chosen: refused in the form, nothing sent.
    backend.expectNone(`${BASE}/variants/${VARIANT_ID}/review/request`);
    expect(host.textContent).toContain('Reviewer is required.');

    testId('review-reviewer')!.click();
    await fixture.whenStable();
    (document.querySelector(`[data-testid="review-reviewer-${MEMBERS[4].email}"]`) as HTMLElement).click();
    type('review-message', '  Please check the hoop mass.  ');
    await fixture.whenStable();
    testId('review-request-submit')!.click();
    const req = backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review/request`);
    expect(req.request.method).toBe('POST');
    expect(req.request.body).toEqual({ reviewerId: MEMBERS[4].userId, message: 'Please check the hoop mass.' });
    req.flush(thread('in_review', [REQUESTED]));
    await fixture.whenStable();
    expect(testId('status-chip')!.textContent).toContain('In review');
    expect(testId('sign-off-state')!.textContent).toContain('waiting for Ada Quill');
    expect(testId('review-request-form')).toBeNull();
    expect(host.querySelectorAll('[data-testid="review-entry"]')).toHaveLength(1);
    expect(statuses).toEqual(['in_review']);
  });

  it('shows a reviewer the decision buttons while in review, and no request form', async () => {
    await openAs('reviewer', 'in_review', [REQUESTED]);
    expect(testId('review-approve')).not.toBeNull();
    expect(testId('review-send-back')).not.toBeNull();
    expect(testId('review-comment-form')).not.toBeNull();
    expect(testId('review-request-form')).toBeNull();
  });

  it('shows no decision buttons before a review is asked for, even to a reviewer', async () => {
    await openAs('reviewer', 'draft');
    expect(testId('review-approve')).toBeNull();
    expect(testId('sign-off-state')!.textContent).toContain('No review asked for yet');
  });

  it('lets admins and owners decide as well', async () => {
    await openAs('admin', 'in_review', [REQUESTED]);
    expect(testId('review-approve')).not.toBeNull();
  });

  it('approves with a note', async () => {
    await openAs('reviewer', 'in_review', [REQUESTED]);
    type('review-decision-body', 'Hoop mass checked; fine.');
    testId('review-approve')!.click();
    const req = backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review/decision`);
    expect(req.request.body).toEqual({ decision: 'approved', body: 'Hoop mass checked; fine.' });
    req.flush(
      thread('approved', [
        REQUESTED,
        { ...REQUESTED, id: '70000000-0000-4000-8000-000000000002', kind: 'approved', reviewer: null, body: 'Hoop mass checked; fine.' },
      ]),
    );
    await fixture.whenStable();
    expect(testId('status-chip')!.getAttribute('data-status')).toBe('approved');
    expect(testId('review-approve')).toBeNull();
  });

  it('asks for a note before sending back, then posts changes_requested', async () => {
    await openAs('owner', 'in_review', [REQUESTED]);
    testId('review-send-back')!.click();
    await fixture.whenStable();
    backend.expectNone(`${BASE}/variants/${VARIANT_ID}/review/decision`);
    expect(host.textContent).toContain('say what should change');
    type('review-decision-body', 'Move the tape 2 cm toward the throat.');
    testId('review-send-back')!.click();
    const req = backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review/decision`);
    expect(req.request.body).toEqual({ decision: 'changes_requested', body: 'Move the tape 2 cm toward the throat.' });
    req.flush(thread('changes_requested', [REQUESTED]));
    await fixture.whenStable();
    expect(testId('status-chip')!.textContent).toContain('Changes requested');
  });

  it('shows the server’s refusal and reloads the thread on a conflict', async () => {
    await openAs('reviewer', 'in_review', [REQUESTED]);
    testId('review-approve')!.click();
    backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review/decision`).flush(
      {
        error: {
          code: 'not_in_review',
          message: 'Only a variant waiting for review can be approved or sent back. Ask for a review first.',
        },
      },
      { status: 409, statusText: 'Conflict' },
    );
    TestBed.tick();
    backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review`).flush(thread('approved', [REQUESTED]));
    await fixture.whenStable();
    expect(testId('error-banner')!.textContent).toContain('Only a variant waiting for review');
    expect(testId('status-chip')!.getAttribute('data-status')).toBe('approved');
  });

  it('posts a comment and clears the box', async () => {
    await openAs('reviewer', 'in_review', [REQUESTED]);
    testId('review-comment-submit')!.click();
    await fixture.whenStable();
    backend.expectNone(`${BASE}/variants/${VARIANT_ID}/review/comments`);
    type('review-comment-body', 'Is the bore length from the drawing?');
    testId('review-comment-submit')!.click();
    const req = backend.expectOne(`${BASE}/variants/${VARIANT_ID}/review/comments`);
    expect(req.request.body).toEqual({ body: 'Is the bore length from the drawing?' });
    req.flush(
      thread('in_review', [
        REQUESTED,
        {
          ...REQUESTED,
          id: '70000000-0000-4000-8000-000000000003',
          kind: 'comment',
          reviewer: null,
          body: 'Is the bore length from the drawing?',
        },
      ]),
    );
    await fixture.whenStable();
    expect(host.querySelectorAll('[data-testid="review-entry"]')).toHaveLength(2);
    expect((testId('review-comment-body') as HTMLTextAreaElement).value).toBe('');
  });
});
