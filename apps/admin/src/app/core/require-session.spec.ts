import { APP_BASE_HREF } from '@angular/common';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { AuthState } from '@tumblewise/api-client';
import { PageNavigation } from '@tumblewise/ui';
import { Component } from '@angular/core';
import { requireSession } from './require-session';

@Component({ template: 'audit page' })
class AuditStub {}

describe('requireSession (admin)', () => {
  const assign = jest.fn();

  beforeEach(() => {
    assign.mockReset();
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'audit', component: AuditStub, canActivate: [requireSession] }]),
        { provide: APP_BASE_HREF, useValue: '/admin/' },
        { provide: PageNavigation, useValue: { assign } },
      ],
    });
  });

  it("sends a signed-out visitor to the designer's sign-in, with the way back", async () => {
    const arrived = await TestBed.inject(Router).navigateByUrl('/audit?page=2');
    expect(arrived).toBe(false);
    expect(assign).toHaveBeenCalledWith('/signin?returnTo=%2Fadmin%2Faudit%3Fpage%3D2');
  });

  it('lets a signed-in user through', async () => {
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: '2026-11-02T09:00:00.000Z',
      },
      memberships: [],
    });
    expect(await TestBed.inject(Router).navigateByUrl('/audit')).toBe(true);
    expect(assign).not.toHaveBeenCalled();
  });
});
