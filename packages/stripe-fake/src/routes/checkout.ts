import express from 'express';
import type Stripe from 'stripe';
import { api, type IdempotencyStore } from '../api';
import { invalidRequest, missingParam, resourceMissing } from '../errors';
import { expand } from '../expand';
import { expireDue, expireSession, requireOpen, sessionRecord } from '../lifecycle';
import { createdFilter, paginate } from '../list';
import { formatAmount, MINIMUM_CHARGE } from '../minimums';
import { newCheckoutSession, newLineItem, type LineItemInput } from '../objects/checkout';
import { expandList, int, list, metadata, obj, onlyKnown, type Params, requiredStr, str } from '../params';
import type { FakeState } from '../state';

const CREATE_PARAMS = [
  'mode',
  'line_items',
  'success_url',
  'cancel_url',
  'customer',
  'customer_email',
  'customer_creation',
  'client_reference_id',
  'metadata',
  'payment_intent_data',
  'payment_method_types',
  'expires_at',
  'locale',
  'submit_type',
  'ui_mode',
  'expand',
];

function lineItemsOf(params: Params): LineItemInput[] {
  const items = list(params, 'line_items');
  if (!items || items.length === 0) throw missingParam('line_items');
  return items.map((raw, i) => {
    const at = `line_items[${i}]`;
    if (typeof raw !== 'object' || raw === null) throw invalidRequest('Invalid object', at);
    const item = raw as Params;
    onlyKnown(item, ['price_data', 'quantity', 'price'], at);
    if (item['price'] !== undefined) throw invalidRequest('The stand-in takes line items with price_data only.', `${at}[price]`);
    const priceData = obj(item, 'price_data', `${at}[price_data]`);
    if (!priceData) throw missingParam(`${at}[price_data]`);
    onlyKnown(priceData, ['currency', 'unit_amount', 'product_data', 'tax_behavior'], `${at}[price_data]`);
    const productData = obj(priceData, 'product_data', `${at}[price_data][product_data]`);
    if (!productData) throw missingParam(`${at}[price_data][product_data]`);
    onlyKnown(productData, ['name', 'description', 'metadata'], `${at}[price_data][product_data]`);
    const unitAmount = int(priceData, 'unit_amount', `${at}[price_data][unit_amount]`);
    if (unitAmount === undefined) throw missingParam(`${at}[price_data][unit_amount]`);
    if (unitAmount < 0) throw invalidRequest('This value must be greater than or equal to 0.', `${at}[price_data][unit_amount]`);
    const quantity = int(item, 'quantity', `${at}[quantity]`);
    if (quantity === undefined) throw missingParam(`${at}[quantity]`);
    if (quantity < 1) throw invalidRequest('This value must be greater than or equal to 1.', `${at}[quantity]`);
    const currency = requiredStr(priceData, 'currency', `${at}[price_data][currency]`);
    if (!/^[a-z]{3}$/.test(currency)) throw invalidRequest(`Invalid currency: ${currency}.`, `${at}[price_data][currency]`);
    return {
      name: requiredStr(productData, 'name', `${at}[price_data][product_data][name]`),
      description: str(productData, 'description', `${at}[price_data][product_data][description]`) ?? null,
      currency,
      unitAmount,
      quantity,
    };
  });
}

function url(params: Params, name: string): string | null {
  const value = str(params, name);
  if (value === undefined) return null;
  try {
    new URL(value);
  } catch {
    throw invalidRequest('Not a valid URL', name, 'url_invalid');
  }
  return value;
}

function createSession(state: FakeState, params: Params, payBaseUrl: string): Stripe.Checkout.Session {
  onlyKnown(params, CREATE_PARAMS);
  const mode = requiredStr(params, 'mode');
  if (mode !== 'payment') throw invalidRequest('The stand-in supports mode=payment only.', 'mode');
  const items = lineItemsOf(params);
  const currency = items[0].currency;
  if (items.some((i) => i.currency !== currency)) throw invalidRequest('All line items must use the same currency.', 'line_items');
  const amountTotal = items.reduce((sum, i) => sum + i.unitAmount * i.quantity, 0);
  const minimum = MINIMUM_CHARGE[currency];
  if (minimum !== undefined && amountTotal < minimum) {
    throw invalidRequest(
      `The Checkout Session's total amount due must add up to at least ${formatAmount(minimum, currency)} ${currency}`,
      'line_items',
      'amount_too_small',
    );
  }
  const customer = str(params, 'customer') ?? null;
  const customerEmail = str(params, 'customer_email') ?? null;
  if (customer && customerEmail)
    throw invalidRequest('You may only specify one of these parameters: customer, customer_email.', 'customer_email');
  if (customer && !state.customers.has(customer)) throw resourceMissing('customer', customer, 'customer');
  const now = state.now();
  const expiresAt = int(params, 'expires_at') ?? now + 24 * 3600;
  if (expiresAt < now + 30 * 60 || expiresAt > now + 24 * 3600) {
    throw invalidRequest(
      'The `expires_at` timestamp must be at least 30 minutes and at most 24 hours after the Checkout Session is created.',
      'expires_at',
    );
  }
  const pid = obj(params, 'payment_intent_data') ?? {};
  onlyKnown(pid, ['metadata', 'description', 'receipt_email', 'statement_descriptor', 'capture_method'], 'payment_intent_data');
  const session = newCheckoutSession(
    {
      currency,
      amountTotal,
      customer,
      customerEmail,
      clientReferenceId: str(params, 'client_reference_id') ?? null,
      successUrl: url(params, 'success_url'),
      cancelUrl: url(params, 'cancel_url'),
      metadata: metadata(params) ?? {},
      expiresAt,
      locale: str(params, 'locale') ?? null,
      submitType: str(params, 'submit_type') ?? null,
    },
    now,
    payBaseUrl,
  );
  const customersEmail = customer ? state.customers.get(customer)?.email : null;
  if (customersEmail) {
    session.customer_details = {
      address: null,
      business_name: null,
      email: customersEmail,
      individual_name: null,
      name: null,
      phone: null,
      tax_exempt: 'none',
      tax_ids: null,
    };
  }
  state.created(session.id);
  state.sessions.set(session.id, {
    session,
    lineItems: items.map((i) => newLineItem(i, now)),
    paymentIntentMetadata: metadata(pid, 'metadata', 'payment_intent_data[metadata]') ?? {},
    paymentIntentDescription: str(pid, 'description', 'payment_intent_data[description]') ?? null,
  });
  return session;
}

/** /v1/checkout/sessions: create, retrieve (expand), expire, list, list line items. */
export function checkoutRoutes(state: FakeState, store: IdempotencyStore, payBaseUrl: () => string) {
  const router = express.Router();
  router.post(
    '/v1/checkout/sessions',
    api(store, ({ params }) => {
      const session = createSession(state, params, payBaseUrl());
      return { body: expand(state, session, expandList(params)) };
    }),
  );
  router.get(
    '/v1/checkout/sessions',
    api(store, ({ params }) => {
      onlyKnown(params, ['limit', 'starting_after', 'ending_before', 'payment_intent', 'status', 'customer', 'created', 'expand']);
      expireDue(state);
      const created = createdFilter(params);
      const [pi, status, customer] = [str(params, 'payment_intent'), str(params, 'status'), str(params, 'customer')];
      const all = [...state.sessions.values()]
        .map((r) => r.session)
        .filter(
          (s) =>
            created(s.created) &&
            (!pi || s.payment_intent === pi) &&
            (!status || s.status === status) &&
            (!customer || s.customer === customer),
        )
        .sort(state.compareNewestFirst);
      return { body: expand(state, paginate(all, params, '/v1/checkout/sessions', 'checkout.session'), expandList(params)) };
    }),
  );
  router.get(
    '/v1/checkout/sessions/:id',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['expand']);
      return { body: expand(state, sessionRecord(state, path['id'], 'session').session, expandList(params)) };
    }),
  );
  router.post(
    '/v1/checkout/sessions/:id/expire',
    api(store, ({ params, path, cause }) => {
      onlyKnown(params, ['expand']);
      const record = sessionRecord(state, path['id'], 'session');
      requireOpen(record);
      expireSession(state, record, cause);
      return { body: expand(state, record.session, expandList(params)) };
    }),
  );
  router.get(
    '/v1/checkout/sessions/:id/line_items',
    api(store, ({ params, path }) => {
      onlyKnown(params, ['limit', 'starting_after', 'ending_before', 'expand']);
      const record = sessionRecord(state, path['id'], 'session');
      return { body: paginate(record.lineItems, params, `/v1/checkout/sessions/${record.session.id}/line_items`, 'item') };
    }),
  );
  return router;
}
