import { APP_BASE_HREF } from '@angular/common';
import { provideHttpClient, withInterceptors } from '@angular/common/http';
import {
  ApplicationConfig,
  type EnvironmentProviders,
  type Provider,
  provideBrowserGlobalErrorListeners,
  provideZonelessChangeDetection,
} from '@angular/core';
import { provideClientHydration, withEventReplay, withHttpTransferCacheOptions, withIncrementalHydration } from '@angular/platform-browser';
import { Routes, provideRouter, withComponentInputBinding } from '@angular/router';
import { apiInterceptorFor } from '../http/api-interceptor';
import { ApiSettings, isSessionCall } from '../http/api-settings';
import { provideI18n } from '../i18n/i18n-providers';

/** Both apps' browser configuration: the same providers, told apart by their API settings. */
export function appConfigFor(
  settings: ApiSettings,
  routes: Routes,
  appProviders: Array<Provider | EnvironmentProviders> = [],
): ApplicationConfig {
  return {
    providers: [
      provideBrowserGlobalErrorListeners(),
      // The served HTML has no <base> element (see ssr/ssr-app.ts), so the router learns its root here.
      { provide: APP_BASE_HREF, useValue: settings.baseHref },
      provideZonelessChangeDetection(),
      provideRouter(routes, withComponentInputBinding()),
      // XMLHttpRequest in the browser (Angular's default backend, always in the bundle; it also
      // reports upload progress): withFetch() would add a second backend to the first load. The
      // server renders with fetch (server-config.ts).
      provideHttpClient(withInterceptors([apiInterceptorFor(settings)])),
      provideClientHydration(
        withEventReplay(),
        // `@defer (hydrate …)` blocks: parts of a page that wake up later, or only when they must.
        withIncrementalHydration(),
        withHttpTransferCacheOptions({
          // While rendering, API calls carry the visitor's cookie; their answers go back only inside
          // that visitor's own no-store page, so the browser may reuse them (api-interceptor.ts).
          includeRequestsWithAuthHeaders: true,
          // Session answers carry a CSRF token bound to the browser's own cookie: never replay them.
          filter: (req) => !isSessionCall(req.url, settings),
        }),
      ),
      // No Material defaults here: they would pull Material's code into the first load. Field
      // defaults are provided where fields live (field-defaults.ts); icons need none, the global
      // styles give Material's default icon class the bundled symbols font (_layerbook.scss).
      provideI18n(),
      ...appProviders,
    ],
  };
}
