import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { InvoiceDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { progressDraft } from './invoice-fixtures';
import { PaymentForm } from './payment-form';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { formByLabels } from '../../shared/testing/form-fields';
import { officeWords } from '../../shared/testing/office-words';

const issued: InvoiceDetail = { ...progressDraft, number: 'INV-0008', status: 'issued', issuedOn: '2026-11-20', amountDue: '800.00' };

function render() {
  TestBed.configureTestingModule({
    providers: [provideTestI18n(officeWords), provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
  });
  const fixture = TestBed.createComponent(PaymentForm);
  fixture.componentRef.setInput('invoice', issued);
  fixture.detectChanges();
  const { type, submit, errorOf } = formByLabels(fixture);
  return { type, submit, errorOf, http: TestBed.inject(HttpTestingController) };
}

describe('the payment form', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('refuses a day after today beside the field, and sends nothing', async () => {
    const { type, submit, errorOf, http } = render();
    type('Amount', '200.00');
    const later = new Date();
    later.setDate(later.getDate() + 2);
    type('Received on', `${later.getMonth() + 1}/${later.getDate()}/${later.getFullYear()}`);
    await submit();
    expect(errorOf('Received on')).toBe('A payment cannot be received after today.');
    http.expectNone({ method: 'POST' });
  });

  it('records a payment received today', async () => {
    const { type, submit, http } = render();
    type('Amount', '200.00');
    await submit();
    const post = http.expectOne({ method: 'POST', url: '/api/invoices/inv-2/payments' });
    expect(post.request.body).toMatchObject({ method: 'transfer', amount: '200.00', reference: '' });
    // the answer is lost: pressed again, the same payment goes with the same key (the API records it once)
    post.flush({ detail: 'Gateway timeout' }, { status: 504, statusText: 'Gateway Timeout' });
    await submit();
    const again = http.expectOne({ method: 'POST', url: '/api/invoices/inv-2/payments' });
    expect(again.request.body.clientKey).toMatch(/^[0-9a-f-]{36}$/);
    expect(again.request.body.clientKey).toBe(post.request.body.clientKey);
    again.flush(issued);
  });
});
