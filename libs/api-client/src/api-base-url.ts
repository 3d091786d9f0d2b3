import { InjectionToken } from '@angular/core';

/** Where the JSON API lives: same origin as the apps, so a path is enough. */
export const API_BASE_URL = new InjectionToken<string>('API_BASE_URL', {
  providedIn: 'root',
  factory: () => '/api/v1',
});

/** True when `url` points at the API (a relative path under the base, or the same origin). */
export function isApiUrl(url: string, base: string): boolean {
  if (url.startsWith(base + '/') || url === base) return true;
  if (typeof location === 'undefined') return false;
  try {
    const parsed = new URL(url, location.origin);
    return parsed.origin === location.origin && parsed.pathname.startsWith(base + '/');
  } catch {
    return false;
  }
}
