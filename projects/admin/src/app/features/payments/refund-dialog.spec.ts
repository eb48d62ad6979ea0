import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { REFUND_PROCESSOR_PROBLEMS, type PaymentDetail, type RefundCreate } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cardOverpayment, cardRefundPending, chequeRefund, transferPayment } from './payment-fixtures';
import { RefundDialog, type RefundDialogData } from './refund-dialog';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { formByLabels } from '../../shared/testing/form-fields';
import { officeWords } from '../../shared/testing/office-words';

function render(payment: PaymentDetail) {
  const close = vi.fn();
  const data: RefundDialogData = { payment, invoiceNumber: 'INV-0007', clientName: 'Hattie Brambleton' };
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      { provide: MAT_DIALOG_DATA, useValue: data },
      { provide: MatDialogRef, useValue: { close } },
    ],
  });
  const fixture = TestBed.createComponent(RefundDialog);
  fixture.detectChanges();
  const { html, field, type, submit, errorOf } = formByLabels(fixture);
  const choose = (words: string): void => {
    const radio = [...html.querySelectorAll('mat-radio-button')].find((r) => r.textContent?.trim() === words);
    radio!.querySelector('input')!.click();
    fixture.detectChanges();
  };
  const component = fixture.componentInstance;
  return { fixture, html, field, type, choose, submit, errorOf, close, component, http: TestBed.inject(HttpTestingController) };
}

describe('the refund dialog', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('offers the card first for a card payment, with what can still be given back already filled in', () => {
    const { html, field } = render(cardOverpayment);
    const choices = [...html.querySelectorAll('mat-radio-button')].map((r) => r.textContent?.trim());
    expect(choices).toEqual([
      'Back to the card, online',
      'Bank transfer (already sent)',
      'Cheque (already written)',
      'Cash (already handed back)',
    ]);
    expect(html.querySelector('mat-radio-button.mat-mdc-radio-checked')?.textContent?.trim()).toBe('Back to the card, online');
    expect(field('Amount to give back').value).toBe('450.00');
    expect(html.textContent).toContain('$450.00 of it can still be given back.');
    // a card refund is dated by the processor: no day or reference to fill in
    expect([...html.querySelectorAll('mat-label')].map((l) => l.textContent?.trim())).not.toContain('Given back on');
    // 70.00 of credit left (120.00 kept − 50.00 given back), the rest off the invoice
    expect(html.querySelector('.split')?.textContent?.trim()).toBe(
      '$70.00 comes out of the credit kept for Hattie Brambleton, and $380.00 off what was paid on INV-0007, which then has $380.00 more due.',
    );
  });

  it('sends a card refund back to the card with the amount and reason only, and closes with it', async () => {
    const { type, submit, close, http, component } = render(cardOverpayment);
    type('Amount to give back', '70');
    type('Why the money goes back', '  Less plaster needed ');
    await submit();
    const post = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    // the dialog's key goes too: the same refund sent again after a lost answer is recorded once
    expect(post.request.body).toEqual({
      method: 'card',
      amount: '70',
      reason: 'Less plaster needed',
      clientKey: expect.stringMatching(/^[0-9a-f-]{36}$/),
    });
    post.flush(cardRefundPending, { status: 201, statusText: 'Created' });
    await new Promise((resolve) => setTimeout(resolve));
    expect(close).toHaveBeenCalledWith(cardRefundPending);
    expect(component.wasSent()).toBe(true);
  });

  it('records a refund by hand with its day and reference', async () => {
    const { html, type, choose, submit, http, field } = render(cardOverpayment);
    choose('Cheque (already written)');
    expect(html.textContent).toContain('Record money you have already given back. Nothing is sent from here.');
    const day = field('Given back on') as HTMLInputElement;
    day.value = '11/26/2026';
    day.dispatchEvent(new Event('input'));
    type('Reference', 'Chq 000231');
    type('Amount to give back', '50.00');
    type('Why the money goes back', 'Paid twice');
    await submit();
    const post = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    expect(post.request.body).toEqual({
      method: 'cheque',
      amount: '50.00',
      reason: 'Paid twice',
      refundedOn: '2026-11-26',
      reference: 'Chq 000231',
      clientKey: expect.stringMatching(/^[0-9a-f-]{36}$/),
    });
    post.flush(chequeRefund, { status: 201, statusText: 'Created' });
  });

  it('does not offer the card for a payment made by hand', () => {
    const { html } = render(transferPayment);
    const choices = [...html.querySelectorAll('mat-radio-button')].map((r) => r.textContent?.trim());
    expect(choices).toEqual(['Bank transfer (already sent)', 'Cheque (already written)', 'Cash (already handed back)']);
    expect(html.querySelector('mat-radio-button.mat-mdc-radio-checked')?.textContent?.trim()).toBe('Bank transfer (already sent)');
    expect(html.querySelector('.split')?.textContent?.trim()).toBe(
      'It comes off what was paid on INV-0007, which then has $1,000.00 more due.',
    );
  });

  it('says beside the field when the amount is more than can be given back, and sends nothing', async () => {
    const { type, submit, errorOf, http } = render(cardOverpayment);
    type('Amount to give back', '450.01');
    type('Why the money goes back', 'Job cancelled');
    await submit();
    expect(errorOf('Amount to give back')).toBe('This is more than the $450.00 that can still be given back.');
    http.expectNone({ method: 'POST' });
  });

  it('refuses a day before the payment was received, beside the field', async () => {
    const { choose, field, type, submit, errorOf, http } = render(cardOverpayment);
    choose('Cash (already handed back)');
    const day = field('Given back on') as HTMLInputElement;
    day.value = '11/23/2026'; // the payment came in on 2026-11-24
    day.dispatchEvent(new Event('input'));
    type('Why the money goes back', 'Paid twice');
    await submit();
    expect(errorOf('Given back on')).toBe('A refund cannot be dated before the payment was received.');
    http.expectNone({ method: 'POST' });
  });

  it('asks for a reason before sending', async () => {
    const { submit, errorOf, http } = render(cardOverpayment);
    await submit();
    expect(errorOf('Why the money goes back')).toBe('Say why the money goes back, like “job cancelled” or “paid twice”.');
    http.expectNone({ method: 'POST' });
  });

  it('puts the server’s refusal beside the field it names', async () => {
    const { fixture, html, type, choose, submit, errorOf, http, close } = render(cardOverpayment);
    choose('Bank transfer (already sent)');
    type('Reference', 'x'.repeat(20));
    type('Why the money goes back', 'Paid twice');
    await submit();
    const message = 'Someone refunded part of this payment a moment ago: at most 380.00 can still be given back.';
    http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' }).flush(
      {
        type: 'about:blank',
        title: 'Check the highlighted fields.',
        status: 400,
        errors: [
          { field: 'method', message: 'Online payments are not set up: record the refund as cheque, transfer or cash.' },
          { field: 'amount', message },
          { field: 'reference', message: 'The bank’s reference has at most 18 characters.' },
        ],
      },
      { status: 400, statusText: 'Bad Request', headers: { 'Content-Type': 'application/problem+json' } },
    );
    await fixture.whenStable();
    fixture.detectChanges();
    expect(errorOf('Amount to give back')).toBe(message);
    expect(html.querySelector('.how [role="alert"]')?.textContent?.trim()).toBe(
      'Online payments are not set up: record the refund as cheque, transfer or cash.',
    );
    expect(errorOf('Reference')).toBe('The bank’s reference has at most 18 characters.');
    expect(close).not.toHaveBeenCalled();
  });

  it('says at the top when the card processor refuses, stays open, and sends the next try as a refund of its own', async () => {
    const { fixture, html, type, choose, submit, http, close, component } = render(cardOverpayment);
    type('Why the money goes back', 'Job cancelled');
    await submit();
    const refused = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    const firstKey = (refused.request.body as RefundCreate).clientKey;
    refused.flush(
      { type: 'about:blank', title: REFUND_PROCESSOR_PROBLEMS.refused, status: 502, detail: 'The card was closed by its bank.' },
      { status: 502, statusText: 'Bad Gateway' },
    );
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('lb-form-alert')?.textContent).toContain('The card was closed by its bank.');
    expect(close).not.toHaveBeenCalled();
    expect(component.wasSent()).toBe(true);

    // the refused refund is marked failed: cash handed back instead is a new refund, with a new key
    choose('Cash (already handed back)');
    type('Amount to give back', '40.00');
    await submit();
    const cash = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    expect(cash.request.body).toMatchObject({ method: 'cash', amount: '40.00' });
    expect((cash.request.body as RefundCreate).clientKey).not.toBe(firstKey);
    cash.flush(chequeRefund, { status: 201, statusText: 'Created' });
    await new Promise((resolve) => setTimeout(resolve));
    expect(close).toHaveBeenCalledWith(chequeRefund);
  });

  it('sends the same key again when the processor did not answer, so a refund already made is not made twice', async () => {
    const { fixture, type, submit, http } = render(cardOverpayment);
    type('Why the money goes back', 'Job cancelled');
    await submit();
    const lost = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    const key = (lost.request.body as RefundCreate).clientKey;
    lost.flush(
      { type: 'about:blank', title: REFUND_PROCESSOR_PROBLEMS.noAnswer, status: 502, detail: 'The refund is kept as being sent back.' },
      { status: 502, statusText: 'Bad Gateway' },
    );
    await fixture.whenStable();
    await submit();
    const again = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    expect((again.request.body as RefundCreate).clientKey).toBe(key);
    again.flush(cardRefundPending, { status: 201, statusText: 'Created' });
    await fixture.whenStable();
  });

  it('makes a new key after the API refuses the key itself (409 naming clientKey)', async () => {
    const { fixture, type, submit, http } = render(cardOverpayment);
    type('Why the money goes back', 'Job cancelled');
    await submit();
    const refused = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    const key = (refused.request.body as RefundCreate).clientKey;
    refused.flush(
      {
        type: 'about:blank',
        title: 'Conflict',
        status: 409,
        detail: 'This refund’s key belongs to a refund that failed: send the refund again as a new one.',
        errors: [{ field: 'clientKey', message: 'Use a new key for each refund.' }],
      },
      { status: 409, statusText: 'Conflict', headers: { 'Content-Type': 'application/problem+json' } },
    );
    await fixture.whenStable();
    await submit();
    const again = http.expectOne({ method: 'POST', url: '/api/payments/pay-2/refunds' });
    expect((again.request.body as RefundCreate).clientKey).not.toBe(key);
    again.flush(cardRefundPending, { status: 201, statusText: 'Created' });
    await fixture.whenStable();
  });
});
