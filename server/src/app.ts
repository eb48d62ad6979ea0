import express, { Express, RequestHandler } from 'express';
import { authRoutes } from './auth/routes';
import { absoluteTimeout, createPassport, restoreSignedIn } from './auth/passport-setup';
import type { AppContext } from './context';
import { fileRoutes } from './files/routes';
import { firmRoutes } from './firms/routes';
import { firmExportRoutes } from './firms/export/routes';
import { compressAnswers } from './http/compression';
import { csrfProtection } from './http/csrf';
import { apiNotFound, problemHandler } from './http/errors';
import { requestLogging } from './http/logger';
import { refuseUndecodablePath } from './http/bad-path';
import { healthRoutes } from './health/health-routes';
import { observeRequests } from './health/request-metrics';
import { signInRateLimit } from './http/rate-limit';
import { useLeanJson } from './http/json-answer';
import { securityHeadersFor } from './http/security';
import { sessionMiddleware } from './http/session';
import { portalAuthRoutes } from './auth/portal-routes';
import { teamRoutes } from './team/routes';
import { clientRoutes, siteRoutes } from './clients/routes';
import { inquiryRoutes } from './inquiries/routes';
import { libraryRoutes } from './library/routes';
import { takeoffRoutes } from './takeoff/routes';
import { estimateRoutes } from './proposals/routes';
import { proposalRoutes } from './proposals/proposal-routes';
import { portalProposalRoutes } from './proposals/portal-routes';
import { jobRoutes } from './jobs/routes';
import { billingPdfRoutes } from './billing/pdf-routes';
import { portalBillingRoutes } from './billing/portal-routes';
import { changeOrderRoutes, jobChangeOrderRoutes } from './billing/change-orders/routes';
import { portalChangeOrderRoutes } from './billing/change-orders/portal-routes';
import { billingSettingsRoutes, billingTodayRoutes, invoiceRoutes } from './billing/routes';
import { jobBillingRoutes } from './billing/job-routes';
import { progressRoutes } from './billing/progress-routes';
import { cashExportRoutes } from './cash/exports/routes';
import { cashRoutes } from './cash/routes';
import { auditRoutes } from './audit/routes';
import { portalPaymentRoutes } from './payments/portal-routes';
import { paymentRoutes } from './payments/routes';
import { paymentWebhookRoutes } from './payments/webhook-routes';
import { sampleRoutes } from './samples/routes';
import { portalSampleRoutes } from './samples/portal-routes';
import { publicFormPost, publicInquiryLimiter, publicRoutes } from './inquiries/public-routes';
import { anonymousPageCache } from './ssr/page-cache';

export interface SsrHandlers {
  readonly admin: RequestHandler;
  readonly portal: RequestHandler;
}

/** The whole HTTP surface, without listening: supertest drives it in-process, main.ts serves it. */
export function createApp(ctx: AppContext, ssr?: SsrHandlers): Express {
  const app = express();
  app.disable('x-powered-by');
  // API answers are no-store; hashing every body for an ETag is wasted work.
  app.set('etag', false);
  useLeanJson(app);
  app.set('trust proxy', ctx.config.NODE_ENV === 'production' ? 1 : false);
  app.use(requestLogging(ctx.logger));
  app.use(observeRequests());
  app.use(securityHeadersFor(ctx.config));
  app.use(refuseUndecodablePath);
  // Probes outside /api: no session, no CSRF, not logged (health/health-routes.ts).
  app.use(healthRoutes(ctx));
  app.use(compressAnswers());
  const inquiryLimiter = publicInquiryLimiter(ctx.config.PUBLIC_FORM_RATE_LIMIT, ctx.pool);
  app.use('/api', api(ctx, inquiryLimiter));
  if (ssr) {
    app.use(anonymousPageCache(ctx));
    app.use('/portal', publicFormPost(ctx, inquiryLimiter, ssr.portal));
    app.use('/portal', ssr.portal);
    app.use(ssr.admin);
  }
  app.use(problemHandler);
  return app;
}

function api(ctx: AppContext, inquiryLimiter: RequestHandler): express.Router {
  const router = express.Router();
  const pass = createPassport(ctx);
  const limiter = signInRateLimit(ctx.config.SIGN_IN_RATE_LIMIT, ctx.pool);
  router.use((_req, res, next) => {
    res.set('cache-control', 'no-store');
    next();
  });
  // The processor signs the raw body: its webhook comes before the JSON parser, sessions and CSRF.
  router.use('/payments/webhook', paymentWebhookRoutes(ctx));
  router.use(express.json({ limit: '100kb' }));
  // Anonymous public pages carry no session, so they need no CSRF token; they are rate limited instead.
  router.use('/public', publicRoutes(ctx, inquiryLimiter));
  router.use(sessionMiddleware(ctx.config, ctx.pool));
  router.use(pass.initialize());
  router.use(restoreSignedIn);
  router.use(absoluteTimeout(ctx));
  router.use(csrfProtection(ctx.config));
  router.use('/auth', authRoutes(ctx, pass, limiter));
  router.use('/portal/boards', portalSampleRoutes(ctx));
  router.use('/portal/proposals', portalProposalRoutes(ctx));
  router.use('/portal/change-orders', portalChangeOrderRoutes(ctx));
  router.use('/portal', portalBillingRoutes(ctx));
  router.use('/portal', portalPaymentRoutes(ctx));
  router.use('/portal', portalAuthRoutes(ctx, limiter));
  router.use('/firm/billing', billingSettingsRoutes(ctx));
  router.use('/firm/export', firmExportRoutes(ctx));
  router.use('/firm', firmRoutes(ctx));
  router.use('/team', teamRoutes(ctx));
  router.use('/inquiries', inquiryRoutes(ctx));
  router.use('/clients', clientRoutes(ctx));
  router.use('/sites', siteRoutes(ctx));
  router.use('/library', libraryRoutes(ctx));
  router.use('/takeoff', takeoffRoutes(ctx));
  router.use('/files', fileRoutes(ctx));
  router.use('/estimates', estimateRoutes(ctx));
  router.use('/proposals', proposalRoutes(ctx));
  router.use('/jobs', jobRoutes(ctx));
  router.use('/jobs', jobBillingRoutes(ctx));
  router.use('/invoices', invoiceRoutes(ctx));
  router.use('/billing', billingTodayRoutes(ctx));
  router.use('/payments', paymentRoutes(ctx));
  router.use('/cash/exports', cashExportRoutes(ctx));
  router.use('/cash', cashRoutes(ctx));
  router.use('/audit', auditRoutes(ctx));
  router.use('/jobs/:id/change-orders', jobChangeOrderRoutes(ctx));
  router.use('/change-orders', changeOrderRoutes(ctx));
  router.use('/jobs', progressRoutes(ctx));
  router.use(billingPdfRoutes(ctx));
  router.use('/samples', sampleRoutes(ctx));
  router.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  router.use(apiNotFound);
  return router;
}
