import express from 'express';
import { api, type IdempotencyStore } from '../api';
import { invalidRequest, resourceMissing } from '../errors';
import { expand } from '../expand';
import { createdFilter, paginate } from '../list';
import { newCustomer } from '../objects/customer';
import { expandList, int, metadata, onlyKnown, str } from '../params';
import type { RefundDesk } from '../refund-desk';
import type { FakeState } from '../state';

const REASONS = ['duplicate', 'fraudulent', 'requested_by_customer'];

/** Customers (create, retrieve), PaymentIntents (retrieve), refunds (create, retrieve, list by charge or payment_intent). */
export function paymentRoutes(state: FakeState, store: IdempotencyStore, refunds: RefundDesk) {
  const router = express.Router();
  router.post(
    '/v1/customers',
    api(store, ({ params }) => {
      onlyKnown(params, ['email', 'name', 'description', 'metadata', 'expand']);
      const customer = newCustomer(
        {
          email: str(params, 'email') ?? null,
          name: str(params, 'name') ?? null,
          description: str(params, 'description') ?? null,
          metadata: metadata(params) ?? {},
        },
        state.now(),
      );
      state.created(customer.id);
      state.customers.set(customer.id, customer);
      state.emit('customer.created', customer, null);
      return { body: customer };
    }),
  );
  router.get(
    '/v1/customers/:id',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['expand']);
      const customer = state.customers.get(path['id']);
      if (!customer) throw resourceMissing('customer', path['id']);
      return { body: expand(state, customer, expandList(params)) };
    }),
  );
  router.get(
    '/v1/payment_intents/:id',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['expand', 'client_secret']);
      const pi = state.paymentIntents.get(path['id']);
      if (!pi) throw resourceMissing('payment_intent', path['id'], 'intent');
      return { body: expand(state, pi, expandList(params)) };
    }),
  );
  router.post(
    '/v1/refunds',
    api(store, ({ params, cause }) => {
      onlyKnown(params, ['payment_intent', 'charge', 'amount', 'metadata', 'reason', 'expand']);
      const reason = str(params, 'reason');
      if (reason !== undefined && !REASONS.includes(reason)) {
        throw invalidRequest('Invalid reason: must be one of duplicate, fraudulent, or requested_by_customer', 'reason');
      }
      const refund = refunds.create(
        {
          paymentIntent: str(params, 'payment_intent'),
          charge: str(params, 'charge'),
          amount: int(params, 'amount'),
          metadata: metadata(params) ?? {},
          reason: reason ?? null,
        },
        cause,
      );
      return { body: expand(state, refund, expandList(params)) };
    }),
  );
  router.get(
    '/v1/refunds',
    api(store, ({ params }) => {
      onlyKnown(params, ['charge', 'payment_intent', 'created', 'limit', 'starting_after', 'ending_before', 'expand']);
      const charge = str(params, 'charge');
      const paymentIntent = str(params, 'payment_intent');
      if (charge && !state.charges.has(charge)) throw resourceMissing('charge', charge, 'charge');
      if (paymentIntent && !state.paymentIntents.has(paymentIntent))
        throw resourceMissing('payment_intent', paymentIntent, 'payment_intent');
      const created = createdFilter(params);
      const all = [...state.refunds.values()]
        .filter((r) => (!charge || r.charge === charge) && (!paymentIntent || r.payment_intent === paymentIntent) && created(r.created))
        .sort(state.compareNewestFirst);
      return { body: expand(state, paginate(all, params, '/v1/refunds', 'refund'), expandList(params)) };
    }),
  );
  router.get(
    '/v1/refunds/:id',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['expand']);
      const refund = state.refunds.get(path['id']);
      if (!refund) throw resourceMissing('refund', path['id']);
      return { body: expand(state, refund, expandList(params)) };
    }),
  );
  return router;
}
