import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import { SignUp } from './sign-up';

describe('SignUp', () => {
  let fixture: ComponentFixture<SignUp>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [SignUp],
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    fixture = TestBed.createComponent(SignUp);
    backend = TestBed.inject(HttpTestingController);
    host = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  function type(testId: string, value: string): void {
    const input = host.querySelector<HTMLInputElement>(`[data-testid="${testId}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }

  async function submit(): Promise<void> {
    host.querySelector<HTMLButtonElement>('[data-testid="signup-submit"]')!.click();
    await fixture.whenStable();
  }

  function errorText(testId: string): string | undefined {
    return host.querySelector(`[data-testid="${testId}"]`)?.textContent?.trim();
  }

  it('labels every field', () => {
    const labels = Array.from(host.querySelectorAll('mat-label')).map((l) => l.textContent?.trim());
    expect(labels).toEqual(['Workspace name', 'Your name', 'E-mail', 'Password']);
  });

  it('shows an error beside each empty field and sends nothing', async () => {
    await submit();
    expect(errorText('signup-workspace-error')).toBe('Workspace name is required.');
    expect(errorText('signup-name-error')).toBe('Your name is required.');
    expect(errorText('signup-email-error')).toBe('E-mail is required.');
    expect(errorText('signup-password-error')).toBe('Password is required.');
    backend.expectNone('/api/v1/auth/signup');
  });

  it('applies the shared rules: e-mail shape, password length', async () => {
    type('signup-workspace', 'Ridgeline Throwing Club');
    type('signup-name', 'Mira Okafor');
    type('signup-email', 'not-an-address');
    type('signup-password', 'short');
    await submit();
    expect(errorText('signup-email-error')).toBe('E-mail must be an e-mail address.');
    expect(errorText('signup-password-error')).toBe('Password must be at least 10 characters.');
    expect(errorText('signup-workspace-error')).toBeUndefined();
    backend.expectNone('/api/v1/auth/signup');
  });

  it('sends the form, signs in and opens the start page', async () => {
    const navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    type('signup-workspace', '  Ridgeline Throwing Club ');
    type('signup-name', 'Mira Okafor');
    type('signup-email', 'mira.okafor@example.test');
    type('signup-password', 'a long enough secret');
    await submit();

    const call = backend.expectOne('/api/v1/auth/signup');
    expect(call.request.body).toEqual({
      workspaceName: 'Ridgeline Throwing Club',
      name: 'Mira Okafor',
      email: 'mira.okafor@example.test',
      password: 'a long enough secret',
    });
    call.flush({
      accessToken: 'token-one',
      expiresIn: 900,
      user: {
        id: '5e4d3c2b-1a09-4f8e-b7d6-c5b4a3928170',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: '2026-12-01T09:00:00.000Z',
      },
      memberships: [],
    });
    await fixture.whenStable();
    expect(TestBed.inject(AuthState).signedIn()).toBe(true);
    expect(navigate).toHaveBeenCalledWith('/');
  });

  it('shows the server refusal beside the field it names', async () => {
    type('signup-workspace', 'Ridgeline Throwing Club');
    type('signup-name', 'Mira Okafor');
    type('signup-email', 'mira.okafor@example.test');
    type('signup-password', 'a long enough secret');
    await submit();
    backend
      .expectOne('/api/v1/auth/signup')
      .flush(
        { error: { code: 'email_taken', message: 'An account with this e-mail already exists.', field: 'email' } },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    expect(errorText('signup-email-error')).toBe('An account with this e-mail already exists.');
    expect(host.querySelector('[data-testid="error-banner"]')).toBeNull();
  });

  it('shows a refusal without a field above the form', async () => {
    type('signup-workspace', 'Ridgeline Throwing Club');
    type('signup-name', 'Mira Okafor');
    type('signup-email', 'mira.okafor@example.test');
    type('signup-password', 'a long enough secret');
    await submit();
    backend
      .expectOne('/api/v1/auth/signup')
      .flush(
        { error: { code: 'too_many_attempts', message: 'Too many sign-ups from here.' } },
        { status: 429, statusText: 'Too Many Requests', headers: { 'Retry-After': '60' } },
      );
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="error-banner"]')?.textContent).toContain('Too many sign-ups from here. Try again in 60 s.');
  });
});
