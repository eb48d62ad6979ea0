import type Stripe from 'stripe';
import { newId } from '../ids';

export interface CustomerInput {
  email: string | null;
  name: string | null;
  description: string | null;
  metadata: Record<string, string>;
}

export function newCustomer(input: CustomerInput, created: number): Stripe.Customer {
  return {
    id: newId('cus', 14),
    object: 'customer',
    address: null,
    balance: 0,
    created,
    currency: null,
    default_source: null,
    delinquent: false,
    description: input.description,
    email: input.email,
    invoice_prefix: null,
    invoice_settings: { custom_fields: null, default_payment_method: null, footer: null, rendering_options: null },
    livemode: false,
    metadata: input.metadata,
    name: input.name,
    phone: null,
    preferred_locales: [],
    shipping: null,
    tax_exempt: 'none',
    test_clock: null,
  };
}
