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
import type { PortalStatement } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { StatementPage } from './statement-page';

/** An invented job: a deposit paid by card, then 200.00 of it given back to the card. */
const statement: PortalStatement = {
  jobId: 'job-1',
  jobTitle: 'Morning room, polished plaster',
  currency: 'USD',
  locale: 'en-US',
  contractSum: '4000.00',
  lines: [
    { on: '2026-11-20', kind: 'invoice', text: 'INV-0007 Deposit', charge: '1200.00', credit: '0.00', balance: '1200.00' },
    { on: '2026-11-22', kind: 'payment', text: 'Payment by card', charge: '0.00', credit: '1200.00', balance: '0.00' },
    { on: '2026-11-25', kind: 'refund', text: 'Refund to card', charge: '0.00', credit: '-200.00', balance: '200.00' },
  ],
  invoiced: '1200.00',
  credited: '0.00',
  paid: '1000.00',
  balanceDue: '200.00',
  unbilled: '2800.00',
};

async function render(): Promise<HTMLElement> {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ billing, payments, proposals, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const fixture = TestBed.createComponent(StatementPage);
  fixture.componentRef.setInput('id', 'job-1');
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne('/api/portal/jobs/job-1/statement').flush(statement);
  await fixture.whenStable();
  fixture.detectChanges();
  http.verify();
  return fixture.nativeElement as HTMLElement;
}

describe('the statement', () => {
  it('shows money given back as its own line that raises the balance', async () => {
    const html = await render();
    const rows = [...html.querySelectorAll('tbody tr')];
    const refund = rows[2];
    expect(refund.querySelector('th')?.textContent).toContain('Refund to card');
    expect(refund.querySelector('mat-icon')?.textContent).toBe('undo');
    const cells = [...refund.querySelectorAll('td')].map((c) => c.textContent?.trim());
    expect(cells).toEqual(['November 25, 2026', '', '-$200.00', '$200.00']);
  });

  it('on a phone each line is a card: every figure carries its column’s name, table roles kept for screen readers', async () => {
    const html = await render();
    expect(html.querySelector('table')?.getAttribute('role')).toBe('table');
    expect([...html.querySelectorAll('thead th')].map((th) => th.getAttribute('role'))).toEqual(Array(5).fill('columnheader'));
    const rows = [...html.querySelectorAll('tbody tr')];
    expect(rows.map((tr) => tr.getAttribute('role'))).toEqual(['row', 'row', 'row']);
    expect([...rows[0].children].map((c) => c.getAttribute('role'))).toEqual(['cell', 'rowheader', 'cell', 'cell', 'cell']);
    /** each figure cell: its label (drawn before it on a phone), its text, and whether it is left off the card as blank */
    const figures = (tr: Element) =>
      [...tr.querySelectorAll('td.num')].map((td) => [
        td.getAttribute('data-label'),
        td.textContent?.trim(),
        td.classList.contains('blank'),
      ]);
    expect(figures(rows[0])).toEqual([
      ['Charged', '$1,200.00', false],
      ['Paid or credited', '', true],
      ['Balance', '$1,200.00', false],
    ]);
    // a zero running balance is still a figure the client reads
    expect(figures(rows[1])).toEqual([
      ['Charged', '', true],
      ['Paid or credited', '$1,200.00', false],
      ['Balance', '$0.00', false],
    ]);
  });
});
