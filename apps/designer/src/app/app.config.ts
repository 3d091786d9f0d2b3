import { provideHttpClient, withInterceptors } from '@angular/common/http';
import {
  ApplicationConfig,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
  provideZonelessChangeDetection,
} from '@angular/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';
import { AuthApi, authInterceptor, errorInterceptor, workspaceStateInterceptor } from '@tumblewise/api-client';
import { provideLabelledOverlayContainer } from '@tumblewise/ui';
import { routes } from './app.routes';

/** Providers of the designer app. */
export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideZonelessChangeDetection(),
    provideRouter(routes, withComponentInputBinding()),
    // Angular's default backend, XMLHttpRequest, not withFetch(): only it reports how much of an
    // upload is sent, and a designer uploads STL files of up to 64 MB.
    provideHttpClient(withInterceptors([authInterceptor, errorInterceptor, workspaceStateInterceptor])),
    // Restore the session from the refresh cookie before the first route is resolved.
    provideAppInitializer(() => inject(AuthApi).restoreSession()),
    provideLabelledOverlayContainer(),
  ],
};
