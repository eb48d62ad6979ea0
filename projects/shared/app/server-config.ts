import { ApplicationConfig, mergeApplicationConfig } from '@angular/core';
import { RenderMode, ServerRoute, provideServerRendering, withRoutes } from '@angular/ssr';

/** Every page depends on who is signed in, so each is rendered per request. */
const SERVER_ROUTES: ServerRoute[] = [{ path: '**', renderMode: RenderMode.Server }];

/** An app's browser configuration plus server rendering of its routes. */
export function serverConfigFor(appConfig: ApplicationConfig): ApplicationConfig {
  return mergeApplicationConfig(appConfig, {
    providers: [provideServerRendering(withRoutes(SERVER_ROUTES))],
  });
}
