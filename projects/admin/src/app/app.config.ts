import { inject, isDevMode, provideAppInitializer } from '@angular/core';
import { provideServiceWorker } from '@angular/service-worker';
import { appConfigFor } from '../../../shared/app/app-config';
import { VISITOR_LANGUAGE } from '../../../shared/i18n/i18n-providers';
import { routes } from './app.routes';
import { Session } from './core/auth/session';
import { API_SETTINGS } from './core/http/api-settings';
import { OfflineMarks } from './features/jobs/sheet/offline/offline-marks';

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
  // Layer marks kept on the phone go out at start and whenever the connection comes back.
  provideAppInitializer(() => inject(OfflineMarks).start()),
]);
