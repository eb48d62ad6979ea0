import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import payments from '../../../i18n/payments/en.json';
import paymentsEs from '../../../i18n/payments/es.json';
import proposals from '../../../i18n/proposals/en.json';
import problems from '../../../i18n/problems/en.json';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { PortalInvoiceDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { Language } from '../../../../../shared/i18n/language';
import { PayByCard } from './pay-by-card';
import { LEAVE_FOR } from './payment-api';
import { openDeposit } from './payment-fixtures';

async function render(invoice: PortalInvoiceDetail, language: 'en' | 'es' = 'en') {
  const leaveFor = vi.fn<(url: string) => void>();
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ billing, payments: language === 'es' ? paymentsEs : payments, proposals, problems, common }, language),
      provideHttpClient(),
      provideHttpClientTesting(),
      { provide: LEAVE_FOR, useValue: leaveFor },
    ],
  });
  await TestBed.inject(Language).use(language);
  const fixture = TestBed.createComponent(PayByCard);
  fixture.componentRef.setInput('invoice', invoice);
  await fixture.whenStable();
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  return { fixture, html, leaveFor, http: TestBed.inject(HttpTestingController), button: () => html.querySelector('button') };
}

describe('paying an invoice by card', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('names the amount due on the button, opens a checkout and sends the browser to the card page', async () => {
    const { fixture, html, http, leaveFor, button } = await render(openDeposit);
    expect(html.querySelector('h2')?.textContent).toBe('Pay online');
    expect(button()?.textContent?.trim()).toContain('Pay $1,200.00 by card');
    button()!.click();
    fixture.detectChanges();
    expect(button()?.disabled).toBe(true);
    expect(html.textContent).toContain('Opening the payment page');
    const post = http.expectOne({ method: 'POST', url: '/api/portal/invoices/inv-1/checkout' });
    post.flush({ url: 'http://127.0.0.1:12111/pay/cs_test_1', checkoutId: 'co-1' });
    await fixture.whenStable();
    expect(leaveFor).toHaveBeenCalledWith('http://127.0.0.1:12111/pay/cs_test_1');
  });

  it('after a refusal (409) reads the invoice again: the server’s reason, and the reason from the invoice as it stands now', async () => {
    const { fixture, html, http, leaveFor, button } = await render({ ...openDeposit, amountDue: '0.30' });
    expect(button()?.textContent).toContain('Pay $0.30 by card');
    button()!.click();
    // The server's refusal (server/src/payments/checkout.ts): a 409 naming the amount. The portal says it in its own words.
    const detail = 'This amount cannot be paid by card: A card payment must be at least 0.50 USD.';
    http.expectOne({ method: 'POST', url: '/api/portal/invoices/inv-1/checkout' }).flush(
      {
        type: 'about:blank',
        title: 'Conflict',
        status: 409,
        detail,
        errors: [{ field: 'amount', message: 'A card payment must be at least 0.50 USD.' }],
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    http.expectOne({ method: 'GET', url: '/api/portal/invoices/inv-1' }).flush({
      ...openDeposit,
      amountDue: '0.30',
      canPayOnline: false,
      payOnlineReason: { code: 'belowMinimum', currency: 'USD', minimum: '0.50' },
    });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role="alert"]')?.textContent).toContain(problems.belowMinimum);
    expect(button()).toBeNull();
    expect(html.querySelector('.note')?.textContent).toContain(
      'The amount due is less than the smallest payment the card processor takes, $0.50.',
    );
    expect(leaveFor).not.toHaveBeenCalled();
  });

  it('after a refusal because the invoice was paid another way meanwhile: no stale amount or button, and the page is told', async () => {
    const { fixture, html, http, leaveFor, button } = await render(openDeposit);
    const changed = vi.fn();
    fixture.componentRef.instance.invoiceChanged.subscribe(changed);
    button()!.click();
    http
      .expectOne({ method: 'POST', url: '/api/portal/invoices/inv-1/checkout' })
      .flush(
        { type: 'about:blank', title: 'Conflict', status: 409, detail: 'Invoice INV-0007 is already paid.' },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    const paid = { ...openDeposit, status: 'paid' as const, amountPaid: '1200.00', amountDue: '0.00', canPayOnline: false };
    http.expectOne({ method: 'GET', url: '/api/portal/invoices/inv-1' }).flush(paid);
    await fixture.whenStable();
    fixture.detectChanges();
    expect(button()).toBeNull();
    expect(html.textContent).not.toContain('$1,200.00');
    expect(html.querySelector('[role="alert"]')?.textContent).toContain(problems.notPayable);
    expect(html.textContent).toContain('Invoice INV-0007 is now paid in full: there is nothing left to pay.');
    expect(html.textContent).not.toContain('the way the invoice says');
    expect(changed).toHaveBeenCalledWith(paid);
    expect(leaveFor).not.toHaveBeenCalled();
  });

  it('when the card page could not be opened (502): says so and lets the client try again, reading nothing', async () => {
    const { fixture, html, http, button } = await render(openDeposit);
    button()!.click();
    http
      .expectOne({ method: 'POST', url: '/api/portal/invoices/inv-1/checkout' })
      .flush({ type: 'about:blank', title: 'The card processor did not answer', status: 502 }, { status: 502, statusText: 'Bad Gateway' });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role="alert"]')?.textContent).toContain(problems.processorDown);
    expect(button()?.disabled).toBe(false);
    expect(button()?.textContent).toContain('Pay $1,200.00 by card');
  });

  it('when paying online is not open: no button, the reason, and the firm’s own way', async () => {
    const { html, button } = await render({
      ...openDeposit,
      amountDue: '0.40',
      canPayOnline: false,
      payOnlineReason: { code: 'belowMinimum', currency: 'USD', minimum: '0.50' },
    });
    expect(button()).toBeNull();
    expect(html.querySelector('h2')?.textContent).toBe('How to pay');
    expect(html.querySelector('.note')?.textContent?.replace(/\s+/g, ' ').trim()).toBe(
      'info Card payment online is not available for this invoice. The amount due is less than the smallest payment the card processor takes, $0.50.',
    );
    expect(html.textContent).toContain('Pay Quillfeather Finishes the way the invoice says, and quote INV-0007.');
  });

  it.each([
    [
      { code: 'belowMinimum', currency: 'USD', minimum: '0.50' },
      'El pago con tarjeta en línea no está disponible para esta factura. El importe pendiente es menor que el pago mínimo que acepta el procesador de tarjetas, $0.50.',
    ],
    [
      { code: 'currencyNotOffered', currency: 'XOF' },
      'El pago con tarjeta en línea no está disponible para esta factura. El procesador de tarjetas no acepta pagos con tarjeta en XOF.',
    ],
    [
      { code: 'refunded' },
      'El pago con tarjeta en línea no está disponible para esta factura. La empresa devolvió lo pagado en esta factura. Por favor, consulte con la empresa antes de pagar.',
    ],
  ] as const)('says the reason %o in the reader’s language, Spanish here', async (reason, said) => {
    const { html } = await render({ ...openDeposit, canPayOnline: false, payOnlineReason: reason }, 'es');
    expect(html.querySelector('h2')?.textContent).toBe('Cómo pagar');
    expect(html.querySelector('.note span')?.textContent?.replace(/\s+/g, ' ').trim()).toBe(said);
  });

  it('when online payments are off altogether: only the firm’s own way', async () => {
    const { html } = await render({ ...openDeposit, canPayOnline: false, payOnlineReason: null });
    expect(html.textContent).not.toContain('not available');
    expect(html.textContent).toContain('quote INV-0007');
  });
});
