import { FetchBackend, HttpBackend } from '@angular/common/http';
import { ApplicationConfig, inject, mergeApplicationConfig } from '@angular/core';
import { RenderMode, ServerRoute, provideServerRendering, withRoutes } from '@angular/ssr';
import { map } from 'rxjs';
import { transferable } from '../http/api-interceptor';

/** Every page depends on who is signed in, so each is rendered per request. */
const SERVER_ROUTES: ServerRoute[] = [{ path: '**', renderMode: RenderMode.Server }];

/**
 * The server's HTTP backend, seen before Angular's transfer cache looks at an answer (the cache
 * sits between the interceptors and the backend): answers lose the API's no-store and set-cookie,
 * so the page carries them to the browser instead of the browser fetching them again.
 */
function transferableBackend(): HttpBackend {
  const fetchBackend = inject(FetchBackend);
  return { handle: (req) => fetchBackend.handle(req).pipe(map(transferable)) };
}

/** An app's browser configuration plus server rendering of its routes. */
export function serverConfigFor(appConfig: ApplicationConfig): ApplicationConfig {
  return mergeApplicationConfig(appConfig, {
    providers: [provideServerRendering(withRoutes(SERVER_ROUTES)), { provide: HttpBackend, useFactory: transferableBackend }],
  });
}
