import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { type ComponentFixture, DeferBlockBehavior, DeferBlockState, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { AttentionNote, BillingToday, InquirySummary, InvoiceSummary, StaffRole, TodayView } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { Session } from '../../core/auth/session';
import { sheetSummaries } from '../jobs/sheet/sheet-fixtures';
import { Today } from './today';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import today from '../../../i18n/today/en.json';
import billing from '../../../i18n/billing/en.json';
import payments from '../../../i18n/payments/en.json';
import sheet from '../../../i18n/sheet/en.json';

const overdueInvoice: InvoiceSummary = {
  id: 'inv-1',
  number: 'INV-0007',
  kind: 'milestone',
  status: 'issued',
  isOverdue: true,
  jobId: 'job-1',
  jobTitle: 'Hall in lime plaster',
  clientId: 'client-1',
  clientName: 'Ada Ward',
  issuedOn: '2026-11-06',
  dueOn: '2026-11-20',
  currency: 'USD',
  total: '4200.00',
  amountDue: '4200.00',
  origin: 'office',
  createdAt: '2026-11-06T10:00:00.000Z',
};
const money: BillingToday = {
  readyToBill: [{ ...overdueInvoice, id: 'inv-2', number: null, status: 'draft', isOverdue: false, kind: 'deposit', origin: 'queue' }],
  overdue: [overdueInvoice],
  changeOrdersWaiting: [
    {
      id: 'co-1',
      jobId: 'job-1',
      jobTitle: 'Hall in lime plaster',
      number: 2,
      title: 'Stair wall',
      amount: '860.00',
      currency: 'USD',
      sentAt: '2026-11-30T09:00:00.000Z',
    },
  ],
  paymentsReceived: [
    {
      paymentId: 'pay-1',
      receiptNumber: 'R-0012',
      clientId: 'client-1',
      clientName: 'Ada Ward',
      invoiceId: 'inv-1',
      invoiceNumber: 'INV-0007',
      amount: '1500.00',
      currency: 'USD',
      method: 'cheque',
      receivedOn: '2026-12-01',
    },
  ],
  needsAttention: [],
};
const euroPaid: AttentionNote = {
  id: 'note-1',
  reason: 'paidOtherAmount',
  invoiceId: 'inv-1',
  invoiceNumber: 'INV-0007',
  clientName: 'Ada Ward',
  amount: '800.00',
  currency: 'EUR',
  asked: '800.00',
  askedCurrency: 'USD',
  notedAt: '2026-12-01T16:00:00.000Z',
};
const inquiries: TodayView = {
  localDate: '2026-12-02',
  overdue: [],
  overdueCount: 0,
  dueToday: [],
  pipeline: { unweighted: '0.00', weighted: '0.00', openCount: 0, currency: 'USD' },
};

interface Rendered {
  text: () => string;
  html: () => HTMLElement;
  http: HttpTestingController;
  settle: () => Promise<void>;
}

async function render(role: StaffRole): Promise<Rendered> {
  TestBed.configureTestingModule({
    // The panels are deferred blocks (hydrated later in the browser): drawn here when a test settles.
    deferBlockBehavior: DeferBlockBehavior.Manual,
    imports: [Today],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideTestI18n({ today, billing, payments, sheet }),
      { provide: Session, useValue: { hasRole: (needed: StaffRole) => needed === 'crew' || role !== 'crew' } },
    ],
  });
  await TestBed.compileComponents();
  const fixture = TestBed.createComponent(Today);
  await drawDeferred(fixture);
  const html = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const settle = async () => {
    await TestBed.inject(ApplicationRef).whenStable();
    await drawDeferred(fixture);
  };
  return { text: () => html().textContent ?? '', html, http: TestBed.inject(HttpTestingController), settle };
}

/** Draws the deferred blocks now on the page. Resources send their requests on the next change detection. */
async function drawDeferred(fixture: ComponentFixture<Today>): Promise<void> {
  TestBed.inject(ApplicationRef).tick();
  for (const block of await fixture.getDeferBlocks()) {
    await block.render(DeferBlockState.Complete);
  }
  TestBed.inject(ApplicationRef).tick();
}

describe('Today', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows the crew their jobs, each opening its sheet, and never asks for money', async () => {
    const { text, html, http, settle } = await render('crew');
    http.expectNone('/api/billing/today');
    http.expectNone('/api/inquiries/today');
    http.expectOne('/api/jobs/sheets').flush(sheetSummaries);
    await settle();
    expect(text()).toContain('Your job sheets');
    expect(text()).toContain('Dining room in lime plaster');
    expect(text()).toContain('14 Orchard Lane, Millbrook');
    expect(html().querySelector('a.job')?.getAttribute('href')).toBe('/sheets/job-1');
    expect(text()).not.toContain('Money');
    expect(text()).not.toContain('$');
  });

  it('shows the office what to bill, what is overdue in days and the change orders waiting', async () => {
    const { text, html, http, settle } = await render('office');
    http.expectOne('/api/inquiries/today').flush(inquiries);
    http.expectOne('/api/billing/today').flush(money);
    await settle();
    expect(text()).toContain('Ready to bill (1)');
    expect(text()).toContain('Deposit for Ada Ward');
    expect(text()).toContain('12 days overdue');
    expect(text()).toContain('Change order 2: Stair wall');
    expect(text()).toContain('Payments received since yesterday (1)');
    expect(text()).toContain('Receipt R-0012 · Ada Ward');
    expect(text()).toContain('$1,500.00 Cheque');
    expect(text()).toContain('for INV-0007 · received yesterday');
    const links = [...html().querySelectorAll('a')].map((a) => a.getAttribute('href'));
    expect(links).toContain('/billing/invoices/inv-2');
    expect(links).toContain('/billing/invoices/inv-1');
    // overdue is said in words with an icon, never by colour alone
    const flag = html().querySelector('.flag');
    expect(flag?.querySelector('mat-icon')?.textContent).toContain('alarm');
    expect(flag?.textContent).toContain('overdue');
    // nothing to check: no heading for it at all
    expect(text()).not.toContain('to check');
  });

  it('says how many follow-ups are overdue in all when the list shows only the oldest, and still lists what is due today', async () => {
    const lead = (id: string, contactName: string, nextFollowUp: string): InquirySummary => ({
      id,
      contactName,
      email: '',
      phone: '',
      siteAddress: '',
      stage: 'new',
      source: 'web_form',
      referrerName: '',
      estimatedValue: null,
      assigneeUserId: null,
      assigneeName: null,
      nextFollowUp,
      isFollowUpOverdue: nextFollowUp < '2026-12-02',
      createdAt: '2026-01-01T12:00:00.000Z',
    });
    const backlog: TodayView = {
      ...inquiries,
      overdue: [lead('inq-1', 'Old lead 1', '2025-01-01'), lead('inq-2', 'Old lead 2', '2025-01-02')],
      overdueCount: 205,
      dueToday: [lead('inq-3', 'Call Back Today', '2026-12-02')],
    };
    const { text, html, http, settle } = await render('office');
    http.expectOne('/api/inquiries/today').flush(backlog);
    http.expectOne('/api/billing/today').flush(money);
    await settle();
    expect(text()).toMatch(/Overdue follow-ups\s*\(205\)/);
    expect(text()).toContain('The 2 waiting longest of 205.');
    expect(html().querySelector('a[href="/inquiries/list?sort=follow_up"]')?.textContent).toContain('See them all by follow-up date');
    expect(text()).toContain('Call Back Today');
  });

  it('puts card payments to check first, each in its own currency, until marked dealt with', async () => {
    const { text, html, http, settle } = await render('office');
    http.expectOne('/api/inquiries/today').flush(inquiries);
    http.expectOne('/api/billing/today').flush({ ...money, needsAttention: [euroPaid] });
    await settle();
    expect(text()).toContain('Card payments and refunds to check (1)');
    expect(text()).toContain('INV-0007 · Ada Ward');
    expect(text()).toContain('Paid €800.00 where the checkout asked $800.00.');
    const headings = [...html().querySelectorAll('h3')].map((h) => h.textContent?.trim() ?? '');
    expect(headings[0]).toContain('to check');
    const button = [...html().querySelectorAll('button')].find((b) => b.textContent?.includes('Mark as dealt with'));
    button!.click();
    const cleared = http.expectOne('/api/billing/attention/note-1/clear');
    expect(cleared.request.method).toBe('POST');
    cleared.flush(null, { status: 204, statusText: 'No Content' });
    // the panel asks again once the POST is answered (the reload is pending, so the app is not stable yet)
    await new Promise((resolve) => setTimeout(resolve));
    TestBed.inject(ApplicationRef).tick();
    http.expectOne('/api/billing/today').flush(money);
    await settle();
    expect(text()).not.toContain('to check');
  });
});
