import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import payments from '../../../i18n/payments/en.json';
import proposals from '../../../i18n/proposals/en.json';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter } from '@angular/router';
import type { PortalInvoiceDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { openDeposit, paidDeposit } from '../payments/payment-fixtures';
import { PayByCard } from '../payments/pay-by-card';
import { InvoicePage } from './invoice-page';
import { Language } from '../../../../../shared/i18n/language';

async function render(invoice: PortalInvoiceDetail, payment?: string) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ billing, payments, proposals, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const fixture = TestBed.createComponent(InvoicePage);
  fixture.componentRef.setInput('id', invoice.id);
  if (payment) fixture.componentRef.setInput('payment', payment);
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController).expectOne(`/api/portal/invoices/${invoice.id}`).flush(invoice);
  await fixture.whenStable();
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  return { fixture, html, text: () => html.textContent ?? '' };
}

describe('the client’s invoice page', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('an open invoice offers to pay its amount due by card; no receipts yet', async () => {
    const { html, text } = await render(openDeposit);
    expect(html.querySelector('lb-pay-by-card button')?.textContent).toContain('Pay $1,200.00 by card');
    expect(html.querySelector('lb-receipt-list')).toBeNull();
    expect(text()).not.toContain('nothing was charged');
  });

  it('shows the invoice as it stands now when the pay button read it again after a refusal', async () => {
    const { fixture, html, text } = await render(openDeposit);
    fixture.debugElement.query(By.directive(PayByCard)).componentInstance.invoiceChanged.emit(paidDeposit);
    fixture.detectChanges();
    await fixture.whenStable();
    expect(text()).toContain('Paid in full. Thank you.');
    expect(html.querySelector('lb-pay-by-card')).toBeNull();
  });

  it('names the deposit rule on a deposit only', async () => {
    const deposit = await render(openDeposit);
    expect(deposit.text()).toContain(`Deposit rule: ${openDeposit.document.depositCapName}`);
    TestBed.inject(HttpTestingController).verify();
    TestBed.resetTestingModule();
    const stage = await render({ ...openDeposit, kind: 'milestone' });
    expect(stage.text()).not.toContain('Deposit rule');
  });

  it('back from the card page without paying, it says nothing was charged', async () => {
    const { html } = await render(openDeposit, 'cancelled');
    const notice = html.querySelector('.cancelled[role="status"]');
    expect(notice?.textContent).toContain('The payment was not completed and nothing was charged. You can try again.');
    expect(notice?.querySelector('mat-icon')?.textContent).toBe('info');
    // said before the invoice itself, where the client lands
    expect(notice?.compareDocumentPosition(html.querySelector('article')!)).toBe(Node.DOCUMENT_POSITION_FOLLOWING);
    expect(html.querySelector('lb-pay-by-card button')).not.toBeNull();
  });

  it('a paid invoice: paid in words, no pay button, its receipt to download', async () => {
    const { html, text } = await render(paidDeposit, 'cancelled');
    // a payment that went through after all: no word of one not completed
    expect(text()).not.toContain('not completed');
    expect(text()).toContain('Paid in full. Thank you.');
    expect(html.querySelector('lb-pay-by-card')).toBeNull();
    const row = html.querySelector('lb-receipt-list li');
    expect(row?.querySelector('strong')?.textContent?.trim()).toBe('Receipt RCT-0007');
    expect(row?.textContent).toContain('Paid by card online, November 22, 2026');
    expect(row?.textContent).toContain('$1,200.00');
    expect(row?.querySelector('mat-icon')?.textContent).toBe('payments');
    const link = row?.querySelector('a[download]');
    expect(link?.getAttribute('href')).toBe('/api/portal/payments/pay-1/receipt.pdf');
    expect(link?.textContent).toContain('Download receipt RCT-0007 (PDF)');
  });

  it('a refunded invoice says so, with the refund’s receipt beside the payment’s', async () => {
    const { html, text } = await render({
      ...paidDeposit,
      status: 'refunded',
      amountPaid: '0.00',
      receipts: [
        ...paidDeposit.receipts,
        { id: 'ref-1', kind: 'refund', number: 'RCT-0009', on: '2026-11-25', method: 'card', amount: '1200.00', currency: 'USD' },
      ],
    });
    expect(text()).toContain('Refunded to you: what you paid on this invoice was given back to you.');
    expect(html.querySelector('lb-pay-by-card')).toBeNull();
    const links = [...html.querySelectorAll('lb-receipt-list a[download]')].map((a) => a.getAttribute('href'));
    expect(links).toEqual(['/api/portal/payments/pay-1/receipt.pdf', '/api/portal/refunds/ref-1/receipt.pdf']);
    expect(html.querySelector('lb-receipt-list')?.textContent).toContain('Refunded to your card');
  });

  it('shows the invoice’s own words as the server wrote them, and reads them again when the client’s language changes', async () => {
    const { html } = await render(openDeposit);
    expect(html.textContent).toContain('Net 14');
    await TestBed.inject(Language).use('es');
    TestBed.inject(ApplicationRef).tick();
    const spanish: PortalInvoiceDetail = {
      ...openDeposit,
      lines: [{ label: 'Anticipo al aceptar la propuesta', amount: '1200.00' }],
      document: { ...openDeposit.document, termsText: 'Pago a 14 días', depositCapName: 'Sin límite de anticipo' },
    };
    TestBed.inject(HttpTestingController).expectOne(`/api/portal/invoices/${openDeposit.id}`).flush(spanish);
    await TestBed.inject(ApplicationRef).whenStable();
    TestBed.inject(ApplicationRef).tick();
    expect(html.textContent).toContain('Anticipo al aceptar la propuesta');
    expect(html.textContent).toContain('Pago a 14 días');
    expect(html.textContent).toContain('Sin límite de anticipo');
  });
});
