import express from 'express';
import { cardEntry, paySession, sessionRecord } from '../lifecycle';
import { closedPage, missingPage, payPage } from '../page';
import type { FakeState } from '../state';

/**
 * The hosted payment page: GET /pay/:id shows it; POST /pay/:id pays with the card entered and
 * 303-redirects to success_url ({CHECKOUT_SESSION_ID} filled in), or shows the page again with the
 * decline or the field to correct, the session still open.
 */
export function browserRoutes(state: FakeState) {
  const router = express.Router();
  const find = (id: string) => {
    try {
      return sessionRecord(state, id);
    } catch {
      return null;
    }
  };
  router.get('/pay/:id', (req, res) => {
    const record = find(req.params.id);
    res.set('cache-control', 'no-store');
    if (!record) return res.status(404).type('html').send(missingPage());
    if (record.session.status !== 'open') return res.type('html').send(closedPage(record.session));
    return res.type('html').send(payPage(record));
  });
  router.post('/pay/:id', express.urlencoded({ extended: false }), (req, res) => {
    const record = find(req.params.id);
    res.set('cache-control', 'no-store');
    if (!record) return res.status(404).type('html').send(missingPage());
    if (record.session.status !== 'open') return res.type('html').send(closedPage(record.session));
    const body = (req.body ?? {}) as Record<string, string | undefined>;
    const entry = { number: body['number'] ?? '', expiry: body['expiry'] ?? '' };
    const result = paySession(state, record.session.id, cardEntry({ number: entry.number, expiry: entry.expiry, cvc: body['cvc'] ?? '' }));
    if (result.ok) {
      const to = result.session.success_url?.replace('{CHECKOUT_SESSION_ID}', result.session.id);
      return to ? res.redirect(303, to) : res.type('html').send(closedPage(result.session));
    }
    return res
      .status(result.field ? 400 : 402)
      .type('html')
      .send(payPage(record, { error: { field: result.field, message: result.message }, entry }));
  });
  return router;
}
