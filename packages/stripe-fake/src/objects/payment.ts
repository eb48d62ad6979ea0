import type Stripe from 'stripe';
import { newId } from '../ids';

export interface PaymentIntentInput {
  amount: number;
  currency: string;
  customer: string | null;
  description: string | null;
  metadata: Record<string, string>;
  receiptEmail: string | null;
}

/** The PaymentIntent a Checkout Session creates when the client first submits a card. */
export function newPaymentIntent(input: PaymentIntentInput, created: number): Stripe.PaymentIntent {
  const id = newId('pi', 24);
  return {
    id,
    object: 'payment_intent',
    allowed_payment_method_types: null,
    amount: input.amount,
    amount_capturable: 0,
    amount_details: { tip: {} },
    amount_received: 0,
    application: null,
    application_fee_amount: null,
    automatic_payment_methods: null,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic_async',
    client_secret: `${id}_secret_${newId('s', 24).slice(2)}`,
    confirmation_method: 'automatic',
    created,
    currency: input.currency,
    customer: input.customer,
    customer_account: null,
    description: input.description,
    excluded_payment_method_types: null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    managed_payments: null,
    metadata: input.metadata,
    next_action: null,
    on_behalf_of: null,
    payment_method: null,
    payment_method_configuration_details: null,
    payment_method_options: {},
    payment_method_types: ['card'],
    payment_record: null,
    processing: null,
    receipt_email: input.receiptEmail,
    review: null,
    setup_future_usage: null,
    shipping: null,
    source: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: 'requires_payment_method',
    transfer_data: null,
    transfer_group: null,
  };
}

export interface CardUsed {
  brand: string;
  last4: string;
  expMonth: number;
  expYear: number;
  funding: string;
  country: string;
}

export interface ChargeInput {
  paymentIntent: Stripe.PaymentIntent;
  paymentMethod: string;
  card: CardUsed;
  email: string | null;
  /** null when the card is accepted; else the decline code and its message. */
  failure: { code: string; declineCode: string; message: string } | null;
}

export function newCharge(input: ChargeInput, created: number): Stripe.Charge {
  const pi = input.paymentIntent;
  const ok = input.failure === null;
  const id = newId('ch', 24);
  return {
    id,
    object: 'charge',
    amount: pi.amount,
    amount_captured: ok ? pi.amount : 0,
    amount_refunded: 0,
    application: null,
    application_fee: null,
    application_fee_amount: null,
    balance_transaction: ok ? newId('txn', 24) : null,
    billing_details: { address: null, email: input.email, name: null, phone: null, tax_id: null },
    calculated_statement_descriptor: 'LAYERBOOK TEST',
    captured: ok,
    created,
    currency: pi.currency,
    customer: typeof pi.customer === 'string' ? pi.customer : null,
    description: pi.description,
    disputed: false,
    failure_balance_transaction: null,
    failure_code: input.failure?.code ?? null,
    failure_message: input.failure?.message ?? null,
    fraud_details: {},
    livemode: false,
    metadata: { ...pi.metadata },
    on_behalf_of: null,
    outcome: {
      advice_code: null,
      network_advice_code: null,
      network_decline_code: null,
      network_status: ok ? 'approved_by_network' : 'declined_by_network',
      reason: input.failure?.declineCode ?? null,
      risk_level: 'normal',
      seller_message: ok ? 'Payment complete.' : 'The bank did not return any further details with this decline.',
      type: ok ? 'authorized' : 'issuer_declined',
    },
    paid: ok,
    payment_intent: pi.id,
    payment_method: input.paymentMethod,
    payment_method_details: {
      type: 'card',
      card: {
        amount_authorized: ok ? pi.amount : null,
        authorization_code: ok ? '123456' : null,
        brand: input.card.brand,
        checks: { address_line1_check: null, address_postal_code_check: null, cvc_check: 'pass' },
        country: input.card.country,
        electronic_commerce_indicator: null,
        exp_month: input.card.expMonth,
        exp_year: input.card.expYear,
        funding: input.card.funding,
        installments: null,
        last4: input.card.last4,
        mandate: null,
        network: input.card.brand,
        network_transaction_id: null,
        regulated_status: 'unregulated',
        three_d_secure: null,
        transaction_link_id: null,
        wallet: null,
      },
    },
    receipt_email: input.email,
    receipt_number: null,
    receipt_url: null,
    refunded: false,
    review: null,
    shipping: null,
    source: null,
    source_transfer: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: ok ? 'succeeded' : 'failed',
    transfer_data: null,
    transfer_group: null,
  };
}

export interface RefundInput {
  charge: Stripe.Charge;
  amount: number;
  metadata: Record<string, string>;
  reason: Stripe.Refund.Reason | null;
  status: 'pending' | 'succeeded';
}

export function newRefund(input: RefundInput, created: number): Stripe.Refund {
  return {
    id: newId('re', 24),
    object: 'refund',
    amount: input.amount,
    balance_transaction: input.status === 'succeeded' ? newId('txn', 24) : null,
    charge: input.charge.id,
    created,
    currency: input.charge.currency,
    customer: typeof input.charge.customer === 'string' ? input.charge.customer : null,
    customer_account: null,
    destination_details: {
      type: 'card',
      card: { reference_status: 'pending', reference_type: 'acquirer_reference_number', type: 'refund' },
    },
    metadata: input.metadata,
    payment_intent: typeof input.charge.payment_intent === 'string' ? input.charge.payment_intent : null,
    payment_method: input.charge.payment_method,
    reason: input.reason,
    receipt_number: null,
    source_transfer_reversal: null,
    status: input.status,
    transfer_reversal: null,
  };
}
