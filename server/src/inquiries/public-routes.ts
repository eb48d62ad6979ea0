import { publicInquiryRequest, type Notice, type PublicFirm } from '@layerbook/contracts';
import express, { RequestHandler, Router } from 'express';
import type { Pool } from 'pg';
import { z } from 'zod';
import type { AppContext } from '../context';
import { HttpError } from '../http/problem';
import { sharedRateLimit } from '../http/rate-limit';
import { fieldProblems, parse } from '../http/validate';
import { formStamp, publicFirm, submitPublicInquiry } from './public-form';

const slugParam = z.strictObject({ slug: z.string().regex(/^[a-z0-9-]{1,60}$/, { error: 'Not a valid firm address.' }) });

/** Per-address limit on inquiries, counted in PostgreSQL so it holds across web processes (http/rate-limit.ts). */
export function publicInquiryLimiter(limit: number, pool: Pool): RequestHandler {
  return sharedRateLimit(
    pool,
    { name: 'public-inquiry', limit, windowMs: 60 * 60 * 1000 },
    new HttpError(429, 'Too many inquiries', 'Too many inquiries from this address. Please call the firm instead, or try later.'),
  );
}

/** Anonymous, no session: the firm's public inquiry form (JSON for the app, form posts without scripts). */
export function publicRoutes(ctx: AppContext, limiter: RequestHandler): Router {
  const router = Router();

  router.get('/firms/:slug', async (req, res) => {
    const { slug } = parse(slugParam, req.params);
    const firm = await publicFirm(ctx, slug);
    const answer = { name: firm.name, slug, formStamp: formStamp(ctx.config.SESSION_SECRET, ctx.now()) } satisfies PublicFirm;
    res.set('cache-control', 'no-store').json(answer);
  });

  router.post('/firms/:slug/inquiries', limiter, async (req, res) => {
    const { slug } = parse(slugParam, req.params);
    const input = parse(publicInquiryRequest, req.body);
    await submitPublicInquiry(ctx, slug, input);
    res.status(201).json({ detail: 'Thank you. The firm has your inquiry and will be in touch.' } satisfies Notice);
  });

  return router;
}

/**
 * The same form posted by a browser before any script runs (application/x-www-form-urlencoded):
 * success redirects to the thank-you page; refusal renders the form again with the prospect's
 * words and each field's message (through the portal's server rendering).
 */
export function publicFormPost(ctx: AppContext, limiter: RequestHandler, renderPortal: RequestHandler): Router {
  const router = Router();
  router.post('/f/:slug/inquiry', express.urlencoded({ extended: false, limit: '50kb' }), limiter, async (req, res, next) => {
    const slugOk = slugParam.safeParse(req.params);
    if (!slugOk.success) return next(new HttpError(404, 'Not found', 'No such firm.'));
    const body = { ...(req.body as Record<string, string>) };
    const form = {
      ...body,
      consent: body['consent'] === 'on' || body['consent'] === 'true',
      yearBuiltUnknown: body['yearBuiltUnknown'] === 'on' || body['yearBuiltUnknown'] === 'true',
    };
    const parsed = publicInquiryRequest.safeParse(form);
    if (parsed.success) {
      try {
        await submitPublicInquiry(ctx, slugOk.data.slug, parsed.data);
        return res.redirect(303, `/portal/f/${slugOk.data.slug}/inquiry/thanks`);
      } catch (error) {
        if (!(error instanceof HttpError) || error.status !== 400) return next(error);
        res.locals['inquiryForm'] = { values: body, errors: error.errors ?? [] };
      }
    } else {
      res.locals['inquiryForm'] = { values: body, errors: fieldProblems(parsed.error) };
    }
    res.status(400);
    req.method = 'GET';
    return renderPortal(req, res, next);
  });
  return router;
}
