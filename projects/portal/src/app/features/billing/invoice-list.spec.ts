import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ItemList, PortalInvoiceSummary } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { openDeposit } from '../payments/payment-fixtures';
import { InvoiceList } from './invoice-list';

/** An invented client's invoices: a deposit paid in full and a stage payment cancelled by a credit note. */
const paid: PortalInvoiceSummary = {
  ...openDeposit,
  status: 'paid',
  amountDue: '0.00',
};
const cancelled: PortalInvoiceSummary = {
  ...paid,
  id: 'inv-2',
  number: 'INV-0009',
  kind: 'milestone',
  status: 'void',
  issuedOn: '2026-11-27',
  dueOn: '2026-12-11',
  total: '850.50',
};

async function render(items: PortalInvoiceSummary[]) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ billing, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const fixture = TestBed.createComponent(InvoiceList);
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController)
    .expectOne('/api/portal/invoices')
    .flush({ items } satisfies ItemList<PortalInvoiceSummary>);
  await fixture.whenStable();
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  const row = (number: string) =>
    [...html.querySelectorAll('tbody tr')].find((tr) => tr.querySelector('th')?.textContent?.trim() === number)!;
  /** each cell's column label (drawn before it on a phone) and its text */
  const cells = (number: string) =>
    [...row(number).querySelectorAll('td')].map((td) => [td.getAttribute('data-label'), td.textContent?.replace(/\s+/g, ' ').trim()]);
  return { html, row, cells };
}

describe('the client’s invoice list', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('a paid invoice shows when it was issued and its total beside the nothing still due, each figure labelled for the phone', async () => {
    const { cells } = await render([paid]);
    expect(cells('INV-0007')).toEqual([
      [null, 'Morning room, polished plaster'],
      ['Issued', 'November 20, 2026'],
      ['Due', 'December 4, 2026'],
      ['Total', '$1,200.00'],
      ['Amount due', '$0.00'],
      [null, 'task_alt Paid'], // the icon's ligature, then its words
    ]);
  });

  it('a cancelled invoice shows no due date: a dash for the eye, words for a screen reader', async () => {
    const { row, cells } = await render([paid, cancelled]);
    const due = row('INV-0009').querySelectorAll('td')[2];
    expect(due.textContent).not.toContain('December 11, 2026');
    expect(due.querySelector('[aria-hidden="true"]')?.textContent).toBe('—');
    expect(due.querySelector('.lb-visually-hidden')?.textContent).toBe('No due date');
    expect(cells('INV-0009')[3]).toEqual(['Total', '$850.50']);
    expect(cells('INV-0009')[5]).toEqual([null, 'block Cancelled by a credit note']);
  });

  it('keeps the table’s roles written out, since a phone draws its rows as cards', async () => {
    const { html } = await render([paid]);
    expect(html.querySelector('table')?.getAttribute('role')).toBe('table');
    const headers = [...html.querySelectorAll('thead th')];
    expect(headers.map((th) => th.getAttribute('role'))).toEqual(Array(7).fill('columnheader'));
    expect(headers.map((th) => th.textContent?.trim())).toEqual(['Invoice', 'Job', 'Issued', 'Due', 'Total', 'Amount due', 'Status']);
    const row = html.querySelector('tbody tr')!;
    expect(row.getAttribute('role')).toBe('row');
    expect([...row.children].map((c) => c.getAttribute('role'))).toEqual(['rowheader', ...Array(6).fill('cell')]);
    // the status is the last cell (the phone walk finds it there) and its icon is never read out
    expect(row.lastElementChild?.querySelector('mat-icon')?.getAttribute('aria-hidden')).toBe('true');
  });
});
