import { appConfigFor } from '../../../shared/app/app-config';
import { routes } from './app.routes';
import { API_SETTINGS } from './core/http/api-settings';

export const appConfig = appConfigFor(API_SETTINGS, routes);
