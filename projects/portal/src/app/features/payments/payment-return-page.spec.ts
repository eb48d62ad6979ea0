import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import payments from '../../../i18n/payments/en.json';
import proposals from '../../../i18n/proposals/en.json';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { CheckoutStatus, PortalInvoiceDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { checkout, openDeposit, paidDeposit } from './payment-fixtures';
import { CHECKOUT_POLL, PaymentReturnPage } from './payment-return-page';

const STATUS_URL = '/api/portal/invoices/inv-1/checkout/co-1';
const INVOICE_URL = '/api/portal/invoices/inv-1';
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function render(first: CheckoutStatus, poll = { everyMs: 5, forMs: 60_000 }, invoice: PortalInvoiceDetail = openDeposit) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ billing, payments, proposals, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      { provide: CHECKOUT_POLL, useValue: poll },
    ],
  });
  const fixture = TestBed.createComponent(PaymentReturnPage);
  fixture.componentRef.setInput('id', 'inv-1');
  fixture.componentRef.setInput('checkoutId', 'co-1');
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne(STATUS_URL).flush(first);
  const html = fixture.nativeElement as HTMLElement;
  const appRef = TestBed.inject(ApplicationRef);
  // Not whenStable: a read in flight (the page asking again) keeps the app busy until it is answered.
  const settle = async () => {
    await pause(0);
    appRef.tick();
    fixture.detectChanges();
  };
  await settle();
  // the invoice is read once the checkout's state is known (a state read may have just recorded the payment)
  http.expectOne(INVOICE_URL).flush(invoice);
  await settle();
  return { fixture, html, http, settle, state: () => html.querySelector('[role="status"]')?.textContent ?? '' };
}

/** The page asks again after its interval: answers the next ask. */
async function answerNext(http: HttpTestingController, settle: () => Promise<void>, status: CheckoutStatus): Promise<void> {
  let asks = http.match(STATUS_URL);
  for (let i = 0; i < 50 && asks.length === 0; i++) {
    await pause(5);
    await settle();
    asks = http.match(STATUS_URL);
  }
  expect(asks.length).toBe(1);
  asks[0].flush(status);
  await settle();
}

describe('the page the card page sends the client back to', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('says the payment is being confirmed, asks again, then shows it paid with its receipt', async () => {
    const { html, http, settle, state } = await render(checkout('confirming'));
    expect(html.querySelector('h1')?.textContent?.trim()).toBe('Payment for invoice INV-0007');
    expect(state()).toContain('Payment received — being confirmed');
    expect(state()).toContain('Amount: $1,200.00');
    expect(html.querySelector('mat-progress-bar[aria-label="Checking the payment"]')).not.toBeNull();

    await answerNext(http, settle, checkout('confirming'));
    expect(state()).toContain('being confirmed');
    await answerNext(http, settle, checkout('paid', true));
    // paid: the invoice is read again for what is left to pay
    http.expectOne(INVOICE_URL).flush(paidDeposit);
    await settle();
    expect(state()).toContain('Paid — receipt RCT-0007');
    const receipt = html.querySelector<HTMLAnchorElement>('a[download]');
    expect(receipt?.textContent).toContain('Download receipt RCT-0007 (PDF)');
    expect(receipt?.getAttribute('href')).toBe('/api/portal/payments/pay-1/receipt.pdf');
    expect(html.textContent).toContain('Invoice INV-0007 is paid in full.');
    expect(html.querySelector('mat-progress-bar')).toBeNull();
    // nothing more is asked once paid
    await pause(30);
    await settle();
    http.expectNone(STATUS_URL);
  });

  it('paid already on arrival: the invoice read after it tells what is still to pay, and nothing is read again', async () => {
    const { html, http, settle } = await render(checkout('paid', true), undefined, {
      ...openDeposit,
      status: 'part_paid',
      amountPaid: '1000.00',
      amountDue: '200.00',
    });
    expect(html.textContent).toContain('Still to pay on invoice INV-0007: $200.00.');
    await pause(30);
    await settle();
    http.expectNone(STATUS_URL);
    http.expectNone(INVOICE_URL);
  });

  it('stops asking after its time, never suggests paying again, and checks again when asked', async () => {
    const { html, http, settle, state } = await render(checkout('confirming'), { everyMs: 5, forMs: 0 });
    await pause(30);
    await settle();
    await settle();
    http.expectNone(STATUS_URL);
    expect(state()).toContain('Payment received — still being confirmed');
    expect(state()).toContain('Please do not pay again');
    const again = [...html.querySelectorAll('button')].find((b) => b.textContent?.includes('Check again'))!;
    again.click();
    await settle();
    http.expectOne(STATUS_URL).flush(checkout('paid', true));
    await settle();
    http.expectOne(INVOICE_URL).flush(paidDeposit);
    await settle();
    expect(state()).toContain('Paid — receipt RCT-0007');
  });

  it('a payment that landed after the invoice was voided: kept as credit, never "Paid"', async () => {
    const keptAsCredit: CheckoutStatus = {
      ...checkout('paid', true),
      credit: { amount: '1200.00', currency: 'USD', isWholePayment: true },
    };
    const { html, state } = await render(keptAsCredit, undefined, {
      ...openDeposit,
      status: 'void',
      amountDue: '0.00',
      canPayOnline: false,
    });
    expect(state()).toContain('Payment kept as credit — receipt RCT-0007');
    expect(state()).toContain(
      'Your payment of $1,200.00 came in, but it could not go on this invoice, so the firm keeps it as credit for you.',
    );
    expect(state()).not.toContain('Paid');
    expect(html.querySelector('a[download]')?.textContent).toContain('Download receipt RCT-0007 (PDF)');
    expect(html.textContent).not.toContain('paid in full');
  });

  it('a card page that closed unpaid: nothing was charged, and the way back to the invoice', async () => {
    const { html, http, settle, state } = await render(checkout('expired'));
    expect(state()).toContain('nothing was charged');
    expect(html.querySelector('a[href="/invoices/inv-1"]')?.textContent).toBe('Back to the invoice');
    await pause(30);
    await settle();
    http.expectNone(STATUS_URL);
  });
});
