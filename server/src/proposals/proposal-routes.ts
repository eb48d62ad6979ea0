import { Router } from 'express';
import type { AppContext } from '../context';

/** Proposal versions (being built). */
export function proposalRoutes(_ctx: AppContext): Router {
  return Router();
}
