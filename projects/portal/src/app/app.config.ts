import { inject } from '@angular/core';
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
]);
