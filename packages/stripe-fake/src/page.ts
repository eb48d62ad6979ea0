import type Stripe from 'stripe';
import { formatAmount } from './minimums';
import type { SessionRecord } from './state';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export interface PageState {
  /** A decline or a field the client must correct; the entry is kept except the CVC. */
  error?: { field: 'number' | 'expiry' | 'cvc' | null; message: string };
  entry?: { number: string; expiry: string };
}

const STYLE = `
  :root { color-scheme: light; font-family: system-ui, sans-serif; color: #1d2329; background: #eef1f3; }
  body { margin: 0; }
  main { max-width: 30rem; margin: 2rem auto; background: #fff; border: 1px solid #c9d1d8; border-radius: 8px; padding: 1.5rem 1.75rem; }
  .notice { font-size: .85rem; background: #fff4d6; border: 1px solid #b58a00; color: #4a3900; padding: .4rem .6rem; border-radius: 4px; }
  h1 { font-size: 1.35rem; margin: .75rem 0 .25rem; }
  .total { font-size: 1.8rem; font-weight: 700; margin: .25rem 0 1rem; }
  ul.items { list-style: none; padding: 0; margin: 0 0 1.25rem; border-top: 1px solid #dde3e8; }
  ul.items li { display: flex; justify-content: space-between; gap: 1rem; padding: .5rem 0; border-bottom: 1px solid #dde3e8; }
  label { display: block; font-weight: 600; margin: .9rem 0 .3rem; }
  input { width: 100%; box-sizing: border-box; font-size: 1.05rem; padding: .55rem .6rem; border: 1px solid #6b7780; border-radius: 4px; }
  input[aria-invalid="true"] { border-color: #b3261e; border-width: 2px; }
  .row { display: flex; gap: 1rem; } .row > div { flex: 1; }
  .error { color: #b3261e; font-weight: 600; margin: .35rem 0 0; }
  .alert { background: #fdecea; border: 1px solid #b3261e; color: #7a1712; padding: .6rem .75rem; border-radius: 4px; margin: 0 0 1rem; }
  button { margin-top: 1.25rem; width: 100%; font-size: 1.1rem; font-weight: 700; padding: .75rem; border: 0; border-radius: 4px; background: #1f5f8b; color: #fff; cursor: pointer; }
  button:focus-visible, input:focus-visible, a:focus-visible { outline: 3px solid #e0a100; outline-offset: 2px; }
  .back { display: inline-block; margin-top: 1rem; color: #1f5f8b; }
  .hint { font-size: .85rem; color: #4b5660; margin: .3rem 0 0; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escape(title)}</title><style>${STYLE}</style></head>
<body><main>
<p class="notice">Test payment page (local stand-in for Stripe Checkout). No real card is charged.</p>
${body}
</main></body>
</html>`;
}

function field(name: 'number' | 'expiry' | 'cvc', label: string, attrs: string, value: string, state: PageState, hint?: string): string {
  const invalid = state.error?.field === name;
  const describedBy = [hint ? `${name}-hint` : '', invalid ? `${name}-error` : ''].filter(Boolean).join(' ');
  return `<label for="${name}">${label}</label>
<input id="${name}" name="${name}" ${attrs} value="${escape(value)}" required${invalid ? ' aria-invalid="true"' : ''}${describedBy ? ` aria-describedby="${describedBy}"` : ''}>
${hint ? `<p class="hint" id="${name}-hint">${hint}</p>` : ''}${invalid ? `<p class="error" id="${name}-error">${escape(state.error!.message)}</p>` : ''}`;
}

/** The hosted payment page of an open session: what is paid, the card fields, Pay, and the way back. */
export function payPage(record: SessionRecord, state: PageState = {}): string {
  const s = record.session;
  const currency = s.currency ?? 'usd';
  const total = formatAmount(s.amount_total ?? 0, currency);
  const items = record.lineItems
    .map(
      (li) =>
        `<li><span>${escape(li.description ?? '')}${(li.quantity ?? 1) > 1 ? ` × ${li.quantity}` : ''}</span><span>${formatAmount(li.amount_total, currency)}</span></li>`,
    )
    .join('');
  const declined = state.error && state.error.field === null ? `<div class="alert" role="alert">${escape(state.error.message)}</div>` : '';
  const fieldError =
    state.error && state.error.field !== null ? `<div class="alert" role="alert">${escape(state.error.message)}</div>` : '';
  const email = s.customer_details?.email ?? s.customer_email;
  const back = s.cancel_url ? `<a class="back" href="${escape(s.cancel_url)}">Cancel and go back</a>` : '';
  return layout(
    `Pay ${total}`,
    `<h1>Pay by card</h1>
<p class="total">${escape(total)}</p>
<ul class="items">${items}</ul>
${email ? `<p>Receipt to <strong>${escape(email)}</strong></p>` : ''}
${declined}${fieldError}
<form method="post" action="/pay/${encodeURIComponent(s.id)}" novalidate>
${field('number', 'Card number', 'inputmode="numeric" autocomplete="cc-number"', state.entry?.number ?? '', state, 'Test cards: 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined.')}
<div class="row"><div>${field('expiry', 'Expiry (MM / YY)', 'inputmode="numeric" autocomplete="cc-exp" placeholder="MM / YY"', state.entry?.expiry ?? '', state)}</div>
<div>${field('cvc', 'Security code (CVC)', 'inputmode="numeric" autocomplete="cc-csc"', '', state)}</div></div>
<button type="submit">Pay ${escape(total)}</button>
</form>
${back}`,
  );
}

/** A session that can no longer be paid: complete (link on to the success page) or expired. */
export function closedPage(session: Stripe.Checkout.Session): string {
  if (session.status === 'complete') {
    const on = session.success_url
      ? `<a class="back" href="${escape(session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id))}">Continue</a>`
      : '';
    return layout('Payment complete', `<h1>This payment is complete</h1><p>Nothing more is needed.</p>${on}`);
  }
  const back = session.cancel_url ? `<a class="back" href="${escape(session.cancel_url)}">Go back</a>` : '';
  return layout(
    'Payment page expired',
    `<h1>This payment page has expired</h1><p>Nothing was charged. Start the payment again from where you came.</p>${back}`,
  );
}

export function missingPage(): string {
  return layout('Payment page not found', '<h1>Payment page not found</h1><p>This address does not lead to a payment.</p>');
}
