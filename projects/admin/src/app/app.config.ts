import { Injector, PLATFORM_ID, inject, isDevMode, provideAppInitializer } from '@angular/core';
import { isPlatformBrowser } from '@angular/common';
import { provideServiceWorker } from '@angular/service-worker';
import { appConfigFor } from '../../../shared/app/app-config';
import { VISITOR_LANGUAGE } from '../../../shared/i18n/i18n-providers';
import { routes } from './app.routes';
import { Session } from './core/auth/session';
import { API_SETTINGS } from './core/http/api-settings';

export const appConfig = appConfigFor(API_SETTINGS, routes, [
  {
    provide: VISITOR_LANGUAGE,
    useFactory: () => {
      const session = inject(Session);
      return () => session.load();
    },
  },
  // A job sheet once opened stays readable without a connection (ngsw-config.json). Browser only
  // (the initializer does nothing while rendering on the server), from the site root whatever the
  // first page (the served HTML has no <base>), once the app is stable or after 30 s at most.
  provideServiceWorker('/ngsw-worker.js', {
    enabled: !isDevMode(),
    scope: '/',
    registrationStrategy: 'registerWhenStable:30000',
  }),
  // Layer marks kept on the phone go out at start and whenever the connection comes back. Loaded
  // after start (browser only) so the first load does not carry the job sheet's code; the sheet
  // pages inject the same root instance (providedIn root), which start() sets listening.
  provideAppInitializer(() => {
    if (!isPlatformBrowser(inject(PLATFORM_ID))) return;
    const injector = inject(Injector);
    void import('./features/jobs/sheet/offline/offline-marks').then((m) => injector.get(m.OfflineMarks).start());
  }),
]);
