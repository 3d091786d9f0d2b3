import { HttpErrorResponse } from '@angular/common/http';
import { inject, Injectable, InjectionToken } from '@angular/core';
import { isErrorBody } from '@tumblewise/shared';
import { firstValueFrom } from 'rxjs';
import { AuthApi } from '../auth/auth-api';
import { AuthState } from '../auth/auth-state';
import { ApiError } from '../errors/api-error';

/** The fetch function downloads use (the browser's own; tests give their own). */
export const DOWNLOAD_FETCH = new InjectionToken<typeof fetch>('DOWNLOAD_FETCH', {
  providedIn: 'root',
  factory: () => (input: RequestInfo | URL, init?: RequestInit) => globalThis.fetch(input, init),
});

/**
 * Downloads from the API (PDF reports, CSV comparisons, JSON documents). The file is fetched with
 * the session's bearer token — refreshed once when the server answers 401 — and handed to the
 * browser as a saved file. A failure rejects with an {@link ApiError} carrying the server's message
 * (read from the JSON error body, which a blob request would otherwise hide).
 */
@Injectable({ providedIn: 'root' })
export class FileDownloads {
  private readonly auth = inject(AuthState);
  private readonly authApi = inject(AuthApi);
  private readonly fetchFn = inject(DOWNLOAD_FETCH);

  /** Fetches `url` (an API path such as `/api/v1/workspaces/…/variants/…/export.pdf`) and saves it as `filename`. */
  async downloadFile(url: string, filename: string): Promise<void> {
    let response = await this.fetchWithToken(url, this.auth.accessToken());
    if (response.status === 401 && this.auth.accessToken()) {
      const session = await firstValueFrom(this.authApi.refresh()).catch(() => null);
      if (session) response = await this.fetchWithToken(url, session.accessToken);
    }
    if (!response.ok) throw await errorOf(response);
    saveBlob(await response.blob(), filename);
  }

  private async fetchWithToken(url: string, token: string | null): Promise<Response> {
    try {
      return await this.fetchFn(url, { headers: token ? { Authorization: `Bearer ${token}` } : {}, credentials: 'same-origin' });
    } catch {
      throw new ApiError(0, 'network', 'The server could not be reached. Check your connection and try again.');
    }
  }
}

/** Hands a blob to the browser as a download named `filename`. */
export function saveBlob(blob: Blob, filename: string): void {
  const href = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = href;
  link.download = filename;
  link.rel = 'noopener';
  link.style.display = 'none';
  document.body.appendChild(link);
  try {
    link.click();
  } finally {
    link.remove();
    // Revoke once the click has been handled; the browser holds the file by then.
    setTimeout(() => URL.revokeObjectURL(href), 0);
  }
}

async function errorOf(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = JSON.parse(await response.text());
  } catch {
    // Not JSON: the status's own message follows.
  }
  return ApiError.fromHttpError(
    new HttpErrorResponse({ status: response.status, error: isErrorBody(body) ? body : null, headers: undefined }),
  );
}
