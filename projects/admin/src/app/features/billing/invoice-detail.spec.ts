import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { InvoiceDetail } from '@layerbook/contracts/types';
import { of } from 'rxjs';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cardOverpayment, cardRefundPending } from '../payments/payment-fixtures';
import { InvoiceDetailPage } from './invoice-detail';
import { issuedSummary, progressDraft } from './invoice-fixtures';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

async function render(invoice: InvoiceDetail, dialog?: object) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideNoopAnimations(),
      ...(dialog ? [{ provide: MatDialog, useValue: dialog }] : []),
    ],
  });
  const fixture = TestBed.createComponent(InvoiceDetailPage);
  fixture.componentRef.setInput('id', invoice.id);
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne(`/api/invoices/${invoice.id}`).flush(invoice);
  await fixture.whenStable();
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  return { fixture, html, http, text: () => html.textContent ?? '' };
}

const buttons = (html: HTMLElement): string[] =>
  [...html.querySelectorAll('button, a[mat-stroked-button]')].map((b) => (b.textContent ?? '').trim());

describe('the invoice page', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows a queue-drafted progress draft for review: what drafted it, the work as an amount to date, Issue and Delete', async () => {
    const { html, text } = await render(progressDraft);
    expect(html.querySelector('h1')?.textContent).toBe('Draft — not sent');
    expect(text()).toContain('Drafted by the schedule: Base coat finished on all 3 surfaces it covers on November 28, 2026.');
    expect(buttons(html)).toEqual(expect.arrayContaining([expect.stringContaining('Issue…'), expect.stringContaining('Delete draft')]));
    expect(buttons(html).some((b) => b.includes('Record a payment'))).toBe(false);
    const work = html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]');
    expect(work?.value).toBe('3500.00');
    expect(text()).toContain('Due this period');
    expect(text()).toContain('10 % of work, 10 % of stored materials');
  });

  it('adds up a progress application’s amounts as the PDF does: earned less retainage, less the deposit, is the total; retainage only said beside', async () => {
    const credited: InvoiceDetail = { ...progressDraft, depositCredit: '135.00', total: '1215.00', amountDue: '1215.00' };
    const { html } = await render(credited);
    const amounts = html.querySelector('dl.amounts')!;
    const rows = [...amounts.querySelectorAll('dt')].map((dt) => [dt.textContent?.trim(), dt.nextElementSibling?.textContent?.trim()]);
    expect(rows.slice(0, 3)).toEqual([
      ['Earned this period, less retainage', '$1,350.00'],
      ['Deposit credited', '−$135.00'],
      ['Total', '$1,215.00'],
    ]);
    expect(amounts.textContent).not.toContain('Retainage');
    expect(html.querySelector('.retainage-note')?.textContent?.trim()).toBe(
      'Retainage kept back this period: $150.00; held on the job to date: $350.00. It is not taken off the amounts above (they are after retainage already): a retainage release bills it.',
    );
  });

  it('warns on a stage payment’s draft whose layer was reopened after it was drafted', async () => {
    const { html, text } = await render({ ...progressDraft, kind: 'milestone', progress: null, reopenedLayer: 'Lime base coat' });
    expect(html.querySelector('[role="note"]')?.textContent).toContain(
      'Lime base coat was reopened after this draft was made: it is no longer done on every surface it covers.',
    );
    expect(buttons(html)).toEqual(expect.arrayContaining([expect.stringContaining('Issue…'), expect.stringContaining('Delete draft')]));
    expect(text()).not.toContain('undefined');
  });

  it('says beside the field why work to date cannot go below what was billed, and sends nothing', async () => {
    const { fixture, html, http } = await render(progressDraft);
    const work = html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]')!;
    work.value = '1500';
    work.dispatchEvent(new Event('input'));
    work.dispatchEvent(new Event('blur'));
    html.querySelector<HTMLFormElement>('form[aria-labelledby="progress-heading"]')!.dispatchEvent(new Event('submit'));
    fixture.detectChanges();
    expect(html.querySelector('mat-error')?.textContent).toContain('is less than the 2000.00 already billed');
    http.expectNone({ method: 'PATCH' });
  });

  it('saves the progress as the API takes it', async () => {
    const { fixture, html, http } = await render(progressDraft);
    const work = html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]')!;
    work.value = '5,000';
    work.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    expect(html.textContent).toContain('$3,000.00'); // this period: 5,000 to date − 2,000 billed before
    html.querySelector<HTMLFormElement>('form[aria-labelledby="progress-heading"]')!.dispatchEvent(new Event('submit'));
    const patch = http.expectOne({ method: 'PATCH', url: '/api/invoices/inv-2' });
    expect(patch.request.body).toEqual({
      periodEnd: '2026-11-30',
      progressLines: [{ valueLineId: 'vl-1', workToDate: { amount: '5000' }, storedMaterials: '0.00' }],
    });
    patch.flush(progressDraft);
  });

  it('takes the work as a percent, shows what it comes to, and sends the percent', async () => {
    const { fixture, html, http } = await render(progressDraft);
    const percentToggle = [...html.querySelectorAll<HTMLButtonElement>('mat-button-toggle button')].find(
      (b) => b.textContent?.trim() === '%',
    )!;
    percentToggle.click();
    fixture.detectChanges();
    const work = html.querySelector<HTMLInputElement>('input[aria-label="Percent done to date for Walls, base coat"]')!;
    expect(work.value).toBe('35'); // nothing stored, so the percent complete is the work's own
    work.value = '62.5';
    work.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    expect(work.closest('mat-form-field')?.textContent).toContain('$6,250.00 to date');
    // back to an amount: what was typed carries over as its amount
    [...html.querySelectorAll<HTMLButtonElement>('mat-button-toggle button')].find((b) => b.textContent?.trim() === 'Amount')!.click();
    fixture.detectChanges();
    expect(html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]')?.value).toBe('6250.00');
    percentToggle.click();
    fixture.detectChanges();
    work.value = '62.5';
    work.dispatchEvent(new Event('input'));
    html.querySelector<HTMLFormElement>('form[aria-labelledby="progress-heading"]')!.dispatchEvent(new Event('submit'));
    const patch = http.expectOne({ method: 'PATCH', url: '/api/invoices/inv-2' });
    expect(patch.request.body.progressLines).toEqual([{ valueLineId: 'vl-1', workToDate: { percent: 62.5 }, storedMaterials: '0.00' }]);
    patch.flush(progressDraft);
  });

  it('puts the server’s refusal beside the line’s field it names', async () => {
    const { fixture, html, http } = await render(progressDraft);
    const stored = html.querySelector<HTMLInputElement>('input[aria-label="Materials stored on site for Walls, base coat"]')!;
    stored.value = '7000';
    stored.dispatchEvent(new Event('input'));
    html.querySelector<HTMLFormElement>('form[aria-labelledby="progress-heading"]')!.dispatchEvent(new Event('submit'));
    const message = 'Work to date and stored materials come to more than the scheduled value 10000.00.';
    http.expectOne({ method: 'PATCH', url: '/api/invoices/inv-2' }).flush(
      {
        type: 'about:blank',
        title: 'Check the highlighted fields.',
        status: 400,
        errors: [{ field: 'progressLines[0].storedMaterials', message }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    fixture.detectChanges();
    expect(stored.closest('mat-form-field')?.querySelector('mat-error')?.textContent).toContain(message);
  });

  it('keeps progress typed but not saved when the notes are saved', async () => {
    const { fixture, html, http } = await render(progressDraft);
    const work = html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]')!;
    work.value = '5,000';
    work.dispatchEvent(new Event('input'));
    const notes = html.querySelector<HTMLTextAreaElement>('textarea')!;
    notes.value = 'Thank you for the prompt access.';
    notes.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    html.querySelector<HTMLFormElement>('form[aria-label="Notes on the invoice"]')!.dispatchEvent(new Event('submit'));
    const patch = http.expectOne({ method: 'PATCH', url: '/api/invoices/inv-2' });
    expect(patch.request.body).toEqual({ notes: 'Thank you for the prompt access.' });
    patch.flush({ ...progressDraft, notes: 'Thank you for the prompt access.' });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector<HTMLInputElement>('input[aria-label="Amount done to date for Walls, base coat"]')?.value).toBe('5,000');
    expect(html.textContent).toContain('Notes saved.');
  });

  it('offers the PDF, a payment and Void on an open invoice, and says overdue in words', async () => {
    const issued: InvoiceDetail = {
      ...progressDraft,
      ...issuedSummary,
      progress: null,
      lines: [{ label: 'Stage payment', amount: '4200.00' }],
    };
    const { html, text } = await render(issued);
    expect(html.querySelector('h1')?.textContent).toBe('INV-0007');
    expect(html.querySelector('.status')?.textContent).toContain('Overdue');
    expect(html.querySelector('.status mat-icon')?.textContent).toBe('alarm');
    expect(html.querySelector<HTMLAnchorElement>('a[href="/api/invoices/inv-1/pdf"]')).not.toBeNull();
    expect(buttons(html)).toEqual(expect.arrayContaining([expect.stringContaining('Record a payment'), expect.stringContaining('Void…')]));
    expect(text()).not.toContain('Drafted by the schedule');
  });

  it('does not offer Void once money came in', async () => {
    const partPaid: InvoiceDetail = { ...progressDraft, ...issuedSummary, status: 'part_paid', amountPaid: '200.00', progress: null };
    const { html, text } = await render(partPaid);
    expect(buttons(html).some((b) => b.includes('Void'))).toBe(false);
    expect(text()).toContain('To void it, refund the payments first.');
  });

  it('offers Void on an invoice issued with nothing due (paid, nothing paid), with no word of refunds', async () => {
    const nothingDue: InvoiceDetail = {
      ...progressDraft,
      ...issuedSummary,
      isOverdue: false,
      status: 'paid',
      total: '0.00',
      amountDue: '0.00',
      amountPaid: '0.00',
      progress: null,
    };
    const { html, text } = await render(nothingDue);
    expect(buttons(html)).toEqual(expect.arrayContaining([expect.stringContaining('Void…')]));
    expect(text()).not.toContain('refund the payments first');
  });

  it('says a refunded invoice is refunded, in words and with its icon, and offers a new payment or Void', async () => {
    const refunded: InvoiceDetail = { ...progressDraft, ...issuedSummary, isOverdue: false, status: 'refunded', progress: null };
    const { html, text } = await render(refunded);
    expect(html.querySelector('.status')?.textContent).toContain('Refunded');
    expect(html.querySelector('.status mat-icon')?.textContent).toBe('undo');
    expect(text()).toContain('Everything paid on this invoice was given back');
    expect(buttons(html)).toEqual(expect.arrayContaining([expect.stringContaining('Record a payment'), expect.stringContaining('Void…')]));
  });

  it('reads the invoice again after a refund and says what it did', async () => {
    const partPaid: InvoiceDetail = {
      ...progressDraft,
      ...issuedSummary,
      status: 'part_paid',
      amountPaid: '380.00',
      amountDue: '3820.00',
      progress: null,
      payments: [cardOverpayment],
    };
    const open = vi.fn(() => ({ afterClosed: () => of(cardRefundPending), componentInstance: { wasSent: () => true } }));
    const { fixture, html, http } = await render(partPaid, { open });
    [...html.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes('Refund…'))!.click();
    await Promise.resolve();
    TestBed.inject(ApplicationRef).tick();
    const after = { ...partPaid, payments: [{ ...cardOverpayment, refundable: '380.00', refunds: [cardRefundPending] }] };
    http.expectOne('/api/invoices/inv-1').flush(after);
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role="status"]')?.textContent).toContain('$70.00 is on its way back to the card.');
    expect(html.querySelector('li.refund .refund-status')?.textContent).toContain('Being sent back');
  });
});
