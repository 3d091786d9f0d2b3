import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Session } from '@tumblewise/shared';
import { PageNavigation } from '@tumblewise/ui';
import { SignIn } from './sign-in';

const SESSION: Session = {
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
};

describe('SignIn', () => {
  let fixture: ComponentFixture<SignIn>;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let navigate: jest.SpyInstance;
  const assign = jest.fn();

  async function open(query: { returnTo?: string; email?: string } = {}): Promise<void> {
    localStorage.clear();
    assign.mockReset();
    TestBed.configureTestingModule({
      imports: [SignIn],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: PageNavigation, useValue: { assign } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    fixture = TestBed.createComponent(SignIn);
    host = fixture.nativeElement;
    if (query.returnTo) fixture.componentRef.setInput('returnTo', query.returnTo);
    if (query.email) fixture.componentRef.setInput('email', query.email);
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  function type(testId: string, value: string): void {
    const input = host.querySelector<HTMLInputElement>(`[data-testid="${testId}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  async function signInWith(password: string): Promise<void> {
    type('signin-email', 'mira.okafor@example.test');
    type('signin-password', password);
    host.querySelector<HTMLButtonElement>('[data-testid="signin-submit"]')!.click();
    await fixture.whenStable();
  }

  it('pre-fills the e-mail from the link', async () => {
    await open({ email: 'mira.okafor@example.test' });
    expect(host.querySelector<HTMLInputElement>('[data-testid="signin-email"]')!.value).toBe('mira.okafor@example.test');
  });

  it('shows wrong credentials above the form', async () => {
    await open();
    await signInWith('not the password');
    backend
      .expectOne('/api/v1/auth/signin')
      .flush(
        { error: { code: 'invalid_credentials', message: 'The e-mail or the password is not right.' } },
        { status: 401, statusText: 'Unauthorized' },
      );
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="error-banner"]')?.textContent).toContain('The e-mail or the password is not right.');
    expect(navigate).not.toHaveBeenCalled();
  });

  it('goes back into the admin app with a full page load', async () => {
    await open({ returnTo: '/admin/members' });
    await signInWith('the right password');
    backend.expectOne('/api/v1/auth/signin').flush(SESSION);
    await fixture.whenStable();
    expect(assign).toHaveBeenCalledWith('/admin/members');
  });

  it('follows a returnTo inside the designer with the router', async () => {
    await open({ returnTo: '/invitations/accept?token=abc' });
    await signInWith('the right password');
    backend.expectOne('/api/v1/auth/signin').flush(SESSION);
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith('/invitations/accept?token=abc');
  });

  it('ignores a returnTo pointing at another site', async () => {
    await open({ returnTo: 'https://elsewhere.example/steal' });
    await signInWith('the right password');
    backend.expectOne('/api/v1/auth/signin').flush(SESSION);
    await fixture.whenStable();
    expect(assign).not.toHaveBeenCalled();
    expect(navigate).toHaveBeenCalledWith('/');
  });
});
