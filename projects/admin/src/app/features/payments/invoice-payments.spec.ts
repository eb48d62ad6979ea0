import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { InvoiceDetail, RefundView } from '@layerbook/contracts/types';
import { of } from 'rxjs';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { progressDraft } from '../billing/invoice-fixtures';
import { type RefundOutcome, InvoicePayments, PENDING_CHECKS, PENDING_CHECK_MS } from './invoice-payments';
import { cardOverpayment, cardRefundPending, chequeRefund, creditGivenBack, overpaymentCredit, transferPayment } from './payment-fixtures';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

const paidInvoice: InvoiceDetail = {
  ...progressDraft,
  id: 'inv-1',
  number: 'INV-0007',
  status: 'part_paid',
  clientName: 'Hattie Brambleton',
  progress: null,
  payments: [transferPayment, { ...cardOverpayment, refunds: [chequeRefund] }],
  clientCredits: [overpaymentCredit, creditGivenBack],
};

function render(invoice: InvoiceDetail, dialogAnswer?: { refund?: RefundView; wasSent: boolean }) {
  const open = vi.fn(() => ({
    afterClosed: () => of(dialogAnswer?.refund),
    componentInstance: { wasSent: () => dialogAnswer?.wasSent ?? false },
  }));
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideNoopAnimations(),
      { provide: MatDialog, useValue: { open } },
    ],
  });
  const fixture = TestBed.createComponent(InvoicePayments);
  fixture.componentRef.setInput('invoice', invoice);
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  const outcomes: RefundOutcome[] = [];
  fixture.componentInstance.refunded.subscribe((o) => outcomes.push(o));
  const payment = (n: number): HTMLElement => html.querySelectorAll<HTMLElement>('li.payment')[n];
  const facts = (el: HTMLElement): string[] =>
    [...el.querySelectorAll('dl > dt')].map((dt) => `${dt.textContent?.trim()}: ${dt.nextElementSibling?.textContent?.trim()}`);
  return { fixture, html, open, outcomes, payment, facts };
}

describe('the payments on an invoice', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows each payment with its receipt, reference, what went on the invoice and a receipt link', () => {
    const { payment, facts } = render(paidInvoice);
    const first = payment(0);
    expect(first.querySelector('h3')?.textContent?.trim()).toBe('$1,000.00 by bank transfer, Nov 20, 2026');
    expect(facts(first)).toEqual(['Receipt: RCT-0007', 'Reference: BACS 4471', 'Went on this invoice: $1,000.00']);
    const receipt = first.querySelector<HTMLAnchorElement>('a[href="/api/payments/pay-1/receipt.pdf"]');
    expect(receipt?.textContent).toContain('Receipt RCT-0007 (PDF)');
    expect(receipt?.querySelector('mat-icon')?.getAttribute('aria-hidden')).toBe('true');
    expect(receipt?.target).toBe('_blank');
  });

  it('says what was kept as credit and given back, lists the refund with its words, icon and receipt', () => {
    const { payment, facts } = render(paidInvoice);
    const second = payment(1);
    expect(facts(second)).toEqual([
      'Receipt: RCT-0008',
      'Went on this invoice: $380.00',
      'Kept as credit: $120.00 for Hattie Brambleton',
      'Refunded: $50.00',
      'Can still be refunded: $450.00',
    ]);
    const refund = second.querySelector<HTMLElement>('li.refund')!;
    expect(refund.querySelector('.refund-status')?.textContent?.trim()).toBe('check_circleRefunded');
    expect(refund.querySelector('.refund-status mat-icon')?.getAttribute('aria-hidden')).toBe('true');
    expect(refund.textContent).toContain('$50.00 by cheque');
    expect(refund.textContent).toContain('Chq 000231');
    expect(refund.textContent).toContain('Why: Paid twice');
    expect(refund.querySelector<HTMLAnchorElement>('a[href="/api/payments/refunds/ref-1/receipt.pdf"]')?.textContent?.trim()).toBe(
      'Refund receipt RCT-0009 (PDF)',
    );
  });

  it('shows the client’s credit plainly', () => {
    const { html } = render(paidInvoice);
    // 120.00 kept − 50.00 given back from it
    expect(html.querySelector('.kept')?.textContent?.trim()).toBe('savings$70.00 kept as credit for Hattie Brambleton');
    const lines = [...html.querySelectorAll('ul[aria-labelledby="credit-heading"] li')].map((li) =>
      li.textContent?.replace(/\s+/g, ' ').trim(),
    );
    expect(lines).toEqual([
      '$120.00 kept on Nov 24, 2026 — Paid beyond the amount due on INV-0007.',
      '$50.00 given back from the credit on Nov 26, 2026 — Refunded to the client',
    ]);
  });

  it('offers Refund… only while something can be given back, and no receipt link without a number', () => {
    const settled = { ...transferPayment, receiptNumber: null, amountRefunded: '1000.00', refundable: '0.00' };
    const { payment, facts } = render({ ...paidInvoice, payments: [settled], clientCredits: [] });
    expect(payment(0).querySelector('button')).toBeNull();
    expect(payment(0).querySelector('a')).toBeNull();
    expect(facts(payment(0))[0]).toBe('Receipt: None: recorded before receipts were numbered');
  });

  it('says a card refund is on its way, with a way to check again', () => {
    const onItsWay = { ...cardOverpayment, refundable: '380.00', refunds: [chequeRefund, cardRefundPending] };
    const { fixture, html, payment } = render({ ...paidInvoice, payments: [onItsWay] });
    const refunds = [...payment(0).querySelectorAll('li.refund')];
    expect(refunds[1].querySelector('.refund-status')?.textContent?.trim()).toBe('hourglass_topBeing sent back');
    expect(refunds[1].querySelector('a')).toBeNull(); // no receipt until it is done
    expect(html.querySelector('.lb-notice')?.textContent).toContain('A refund is on its way back to the card.');
    const checks = vi.fn();
    fixture.componentInstance.checkAgain.subscribe(checks);
    html.querySelector<HTMLButtonElement>('.lb-notice button')!.click();
    expect(checks).toHaveBeenCalled();
  });

  it('reads the invoice again by itself every few seconds while a refund is on its way, for about a minute', () => {
    vi.useFakeTimers();
    try {
      const onItsWay = { ...paidInvoice, payments: [{ ...cardOverpayment, refunds: [cardRefundPending] }] };
      const { fixture } = render(onItsWay);
      const checks = vi.fn();
      fixture.componentInstance.checkAgain.subscribe(checks);
      vi.advanceTimersByTime(PENDING_CHECK_MS);
      expect(checks).toHaveBeenCalledTimes(1);
      // each answer still pending asks again, up to the limit
      for (let i = 0; i < PENDING_CHECKS + 3; i++) {
        fixture.componentRef.setInput('invoice', { ...onItsWay });
        fixture.detectChanges();
        vi.advanceTimersByTime(PENDING_CHECK_MS);
      }
      expect(checks).toHaveBeenCalledTimes(PENDING_CHECKS);
      // settled: no more asking
      checks.mockClear();
      TestBed.resetTestingModule();
      const settled = render({
        ...paidInvoice,
        payments: [{ ...cardOverpayment, refunds: [{ ...cardRefundPending, status: 'succeeded' }] }],
      });
      settled.fixture.componentInstance.checkAgain.subscribe(checks);
      vi.advanceTimersByTime(PENDING_CHECK_MS * 3);
      expect(checks).not.toHaveBeenCalled();
    } finally {
      vi.useRealTimers();
    }
  });

  it('asks the card processor again about a refund left pending, and passes on its answer', async () => {
    const { fixture, payment, outcomes } = render({ ...paidInvoice, payments: [{ ...cardOverpayment, refunds: [cardRefundPending] }] });
    const http = TestBed.inject(HttpTestingController);
    const ask = () =>
      [...payment(0).querySelectorAll<HTMLButtonElement>('li.refund button')].find((b) => b.textContent?.includes('again'))!;
    ask().click();
    fixture.detectChanges();
    expect(ask().disabled).toBe(true);
    const post = http.expectOne({ method: 'POST', url: '/api/payments/refunds/ref-2/send' });
    expect(post.request.body).toEqual({});
    post.flush({ ...cardRefundPending, status: 'succeeded', receiptNumber: 'RCT-0011' });
    await fixture.whenStable();
    expect(outcomes).toEqual([
      {
        refund: { ...cardRefundPending, status: 'succeeded', receiptNumber: 'RCT-0011' },
        words: '$70.00 refunded to the card. Refund receipt RCT-0011.',
      },
    ]);

    fixture.detectChanges();
    ask().click();
    http.expectOne({ method: 'POST', url: '/api/payments/refunds/ref-2/send' }).flush(
      {
        type: 'about:blank',
        title: 'The payment processor did not answer',
        status: 502,
        detail:
          'The refund is kept as being sent back: it is settled when the processor confirms it, or send it again — nothing is refunded twice.',
      },
      { status: 502, statusText: 'Bad Gateway' },
    );
    await fixture.whenStable();
    expect(outcomes[1]).toEqual({
      refund: null,
      words: null,
      problem:
        'The refund is kept as being sent back: it is settled when the processor confirms it, or send it again — nothing is refunded twice.',
    });

    // settled meanwhile: nothing to say, the invoice read again says how
    fixture.detectChanges();
    ask().click();
    http
      .expectOne({ method: 'POST', url: '/api/payments/refunds/ref-2/send' })
      .flush({ type: 'about:blank', title: 'This refund is already settled.', status: 409 }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(outcomes[2]).toEqual({ refund: null, words: null });
  });

  it('offers to ask again only for a card refund still pending', () => {
    const { payment } = render({
      ...paidInvoice,
      payments: [{ ...cardOverpayment, refunds: [chequeRefund, { ...cardRefundPending, status: 'failed' }] }],
    });
    expect(payment(0).querySelectorAll('li.refund button')).toHaveLength(0);
  });

  it('says a failed refund failed, in words and with its reason', () => {
    const failed = { ...cardRefundPending, status: 'failed' as const, failureMessage: 'The card was closed by its bank.' };
    const { payment } = render({ ...paidInvoice, payments: [{ ...cardOverpayment, refunds: [failed] }] });
    const refund = payment(0).querySelector('li.refund')!;
    expect(refund.querySelector('.refund-status')?.textContent?.trim()).toBe('errorRefund failed');
    expect(refund.textContent).toContain('The card was closed by its bank.');
  });

  it('opens the refund dialog for the payment and passes on what it did', async () => {
    const { html, open, outcomes, payment } = render(paidInvoice, { refund: cardRefundPending, wasSent: true });
    payment(1).querySelector<HTMLButtonElement>('button')!.click();
    await Promise.resolve();
    expect(open).toHaveBeenCalledWith(
      expect.anything(),
      expect.objectContaining({ data: { payment: paidInvoice.payments[1], invoiceNumber: 'INV-0007', clientName: 'Hattie Brambleton' } }),
    );
    expect(outcomes).toEqual([
      {
        refund: cardRefundPending,
        words: '$70.00 is on its way back to the card. It shows as refunded here once the card processor confirms it.',
      },
    ]);
    expect(html).toBeTruthy();
  });

  it('asks the page to read the invoice again when a refund was refused after being sent, and not after a plain cancel', async () => {
    const refused = render(paidInvoice, { wasSent: true });
    refused.payment(1).querySelector<HTMLButtonElement>('button')!.click();
    await Promise.resolve();
    expect(refused.outcomes).toEqual([{ refund: null, words: null }]);
    TestBed.resetTestingModule();
    const cancelled = render(paidInvoice, { wasSent: false });
    cancelled.payment(1).querySelector<HTMLButtonElement>('button')!.click();
    await Promise.resolve();
    expect(cancelled.outcomes).toEqual([]);
  });
});
