import type Stripe from 'stripe';
import { newId } from '../ids';

export interface LineItemInput {
  name: string;
  description: string | null;
  currency: string;
  unitAmount: number;
  quantity: number;
}

export function newLineItem(input: LineItemInput, created: number): Stripe.LineItem {
  const total = input.unitAmount * input.quantity;
  const price: Stripe.Price = {
    id: newId('price', 24),
    object: 'price',
    active: false,
    billing_scheme: 'per_unit',
    created,
    currency: input.currency,
    custom_unit_amount: null,
    livemode: false,
    lookup_key: null,
    metadata: {},
    nickname: null,
    product: newId('prod', 14),
    recurring: null,
    tax_behavior: 'unspecified',
    tiers_mode: null,
    transform_quantity: null,
    type: 'one_time',
    unit_amount: input.unitAmount,
    unit_amount_decimal: null,
  };
  return {
    id: newId('li', 24),
    object: 'item',
    adjustable_quantity: null,
    amount_discount: 0,
    amount_subtotal: total,
    amount_tax: 0,
    amount_total: total,
    currency: input.currency,
    description: input.name,
    metadata: {},
    price,
    quantity: input.quantity,
  };
}

export interface SessionInput {
  currency: string;
  amountTotal: number;
  customer: string | null;
  customerEmail: string | null;
  clientReferenceId: string | null;
  successUrl: string | null;
  cancelUrl: string | null;
  metadata: Record<string, string>;
  expiresAt: number;
  locale: Stripe.Checkout.Session.Locale | null;
  submitType: Stripe.Checkout.Session.SubmitType | null;
}

/** A new open Checkout Session in payment mode; its page is `${payBaseUrl}/pay/<id>`. */
export function newCheckoutSession(input: SessionInput, created: number, payBaseUrl: string): Stripe.Checkout.Session {
  const id = newId('cs_test', 58);
  return {
    id,
    object: 'checkout.session',
    adaptive_pricing: null,
    after_expiration: null,
    allow_promotion_codes: null,
    allowed_payment_method_types: null,
    amount_subtotal: input.amountTotal,
    amount_total: input.amountTotal,
    automatic_tax: { enabled: false, liability: null, provider: null, status: null },
    billing_address_collection: null,
    cancel_url: input.cancelUrl,
    client_reference_id: input.clientReferenceId,
    client_secret: null,
    collected_information: null,
    consent: null,
    consent_collection: null,
    created,
    currency: input.currency,
    currency_conversion: null,
    custom_fields: [],
    custom_text: { after_submit: null, shipping_address: null, submit: null, terms_of_service_acceptance: null },
    customer: input.customer,
    customer_account: null,
    customer_creation: input.customer ? null : 'if_required',
    customer_details: input.customerEmail
      ? {
          address: null,
          business_name: null,
          email: input.customerEmail,
          individual_name: null,
          name: null,
          phone: null,
          tax_exempt: 'none',
          tax_ids: null,
        }
      : null,
    customer_email: input.customerEmail,
    discounts: [],
    expires_at: input.expiresAt,
    integration_identifier: null,
    invoice: null,
    invoice_creation: {
      enabled: false,
      invoice_data: {
        account_tax_ids: null,
        custom_fields: null,
        description: null,
        footer: null,
        issuer: null,
        metadata: {},
        rendering_options: null,
      },
    },
    livemode: false,
    locale: input.locale,
    managed_payments: null,
    metadata: input.metadata,
    mode: 'payment',
    origin_context: null,
    payment_intent: null,
    payment_link: null,
    payment_method_collection: 'if_required',
    payment_method_configuration_details: null,
    payment_method_options: {},
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    permissions: null,
    recovered_from: null,
    saved_payment_method_options: null,
    setup_intent: null,
    shipping_address_collection: null,
    shipping_cost: null,
    shipping_options: [],
    status: 'open',
    submit_type: input.submitType,
    subscription: null,
    success_url: input.successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted_page',
    url: `${payBaseUrl}/pay/${id}`,
    wallet_options: null,
  };
}
