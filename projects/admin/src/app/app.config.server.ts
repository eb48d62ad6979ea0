import { serverConfigFor } from '../../../shared/app/server-config';
import { appConfig } from './app.config';

export const config = serverConfigFor(appConfig);
