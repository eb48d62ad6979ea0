import { RenderMode, ServerRoute } from '@angular/ssr';

/** Every page depends on who is signed in, so each is rendered per request. */
export const serverRoutes: ServerRoute[] = [{ path: '**', renderMode: RenderMode.Server }];
