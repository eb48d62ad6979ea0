import { Router } from 'express';
import type { AppContext } from '../context';

/** Takeoff routes (being built). */
export function takeoffRoutes(_ctx: AppContext): Router {
  return Router();
}
