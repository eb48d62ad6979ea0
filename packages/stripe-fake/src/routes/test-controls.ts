import express, { type NextFunction, type Request, type Response } from 'express';
import type { CardInput, StripeFakeControls } from '../controls';

type Body = Record<string, unknown>;

const wrap = (fn: (req: Request, res: Response) => unknown) => (req: Request, res: Response, next: NextFunction) => {
  Promise.resolve(fn(req, res)).catch(next);
};

/**
 * The test controls over HTTP (JSON), for the e2e setup and manual trials; the same as
 * `fake.controls` in-process. No authentication: the stand-in listens on loopback only.
 */
export function testControlRoutes(controls: StripeFakeControls) {
  const router = express.Router();
  router.use('/_test', express.json());
  router.get('/_test/health', (_req, res) => {
    res.json({ ok: true });
  });
  router.post(
    '/_test/checkout/:id/pay',
    wrap((req, res) => {
      const body = (req.body ?? {}) as Body;
      const card = (body['card'] ?? (typeof body['number'] === 'string' ? body : undefined)) as CardInput | undefined;
      const result = controls.pay(req.params['id'] as string, card);
      if (result.ok) return res.json({ session: result.session, payment_intent: result.paymentIntent });
      return res
        .status(402)
        .json({ error: { type: 'card_error', code: result.code, decline_code: result.declineCode, message: result.message } });
    }),
  );
  router.post(
    '/_test/checkout/:id/expire',
    wrap((req, res) => res.json(controls.expire(req.params['id'] as string))),
  );
  router.get('/_test/webhook-endpoints', (_req, res) => {
    res.json({ urls: controls.webhookUrls() });
  });
  router.post(
    '/_test/webhook-endpoints',
    wrap((req, res) => {
      const body = (req.body ?? {}) as Body;
      if (Array.isArray(body['urls'])) controls.setWebhookUrls(body['urls'].map(String));
      else if (typeof body['url'] === 'string') controls.addWebhookUrl(body['url']);
      else return res.status(400).json({ error: { type: 'invalid_request_error', message: 'Send { "url": "…" } or { "urls": [ … ] }.' } });
      return res.json({ urls: controls.webhookUrls() });
    }),
  );
  router.get('/_test/events', (req, res) => {
    res.json({ data: controls.events(typeof req.query['type'] === 'string' ? req.query['type'] : undefined) });
  });
  router.post(
    '/_test/events/:id/deliver',
    wrap(async (req, res) => {
      const id = req.params['id'] as string;
      const body = (req.body ?? {}) as Body;
      const url = typeof body['url'] === 'string' ? body['url'] : undefined;
      if (body['badSignature'] === true) return res.json({ attempts: [await controls.deliverBadlySigned(id, { url })] });
      if (body['stale'] !== undefined && body['stale'] !== false) {
        const ageSeconds = typeof body['stale'] === 'number' ? body['stale'] : undefined;
        return res.json({ attempts: [await controls.deliverStale(id, { ageSeconds, url })] });
      }
      const times = typeof body['times'] === 'number' ? body['times'] : 1;
      return res.json({ attempts: await controls.deliverAgain(id, { times, concurrently: body['concurrently'] === true, url }) });
    }),
  );
  router.post('/_test/webhooks/hold', (_req, res) => {
    controls.hold();
    res.json({ holding: true });
  });
  router.post(
    '/_test/webhooks/release',
    wrap(async (req, res) => {
      const order = ((req.body ?? {}) as Body)['order'] === 'reverse' ? 'reverse' : 'sent';
      res.json({ attempts: await controls.release(order) });
    }),
  );
  router.post('/_test/webhooks/pause', (_req, res) => {
    controls.pause();
    res.json({ holding: true });
  });
  router.post(
    '/_test/webhooks/resume',
    wrap(async (_req, res) => res.json({ attempts: await controls.resume() })),
  );
  router.get('/_test/webhooks/attempts', (req, res) => {
    res.json({ data: controls.attempts(typeof req.query['event'] === 'string' ? req.query['event'] : undefined) });
  });
  router.post(
    '/_test/refunds/:id/settle',
    wrap((req, res) => {
      const outcome = ((req.body ?? {}) as Body)['outcome'] === 'failed' ? 'failed' : 'succeeded';
      res.json(controls.settleRefund(req.params['id'] as string, outcome));
    }),
  );
  return router;
}
