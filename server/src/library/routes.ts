import { Router } from 'express';
import type { AppContext } from '../context';

/** Library routes (being built). */
export function libraryRoutes(_ctx: AppContext): Router {
  return Router();
}
