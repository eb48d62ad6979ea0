import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { CashJobs, CashReceivables } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { Session } from '../../core/auth/session';
import { Cash } from './cash';
import { FORECAST, OFFICE_JOBS, OWNER_JOBS, RECEIVABLES, RECEIVED, drillAnswer } from './cash-fixtures';
import { RECEIVABLE_INVOICES_URL, drillFromParams } from './receivable-drill';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

async function open(
  url: string,
  jobs: CashJobs,
  isOwner = true,
  receivables: CashReceivables = RECEIVABLES,
): Promise<{ http: HttpTestingController; html: () => HTMLElement; asOfSent: string | null }> {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      { provide: Session, useValue: { isOwner: () => isOwner, hasRole: () => true, user: () => ({ timeZone: 'America/Chicago' }) } },
    ],
  });
  await TestBed.inject(Router).navigateByUrl(url);
  const fixture = TestBed.createComponent(Cash);
  // Resources send their requests on the next change detection; whenStable would wait for their answers.
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  const owed = http.expectOne((request) => request.url === '/api/cash/receivables');
  const asOfSent = owed.request.params.get('asOf');
  owed.flush(receivables);
  http.expectOne('/api/cash/received').flush(RECEIVED);
  http.expectOne('/api/cash/forecast').flush(FORECAST);
  http.expectOne('/api/cash/jobs').flush(jobs);
  answerDrill(http);
  await settle();
  return { http, html: () => fixture.nativeElement as HTMLElement, asOfSent };
}

/** Answers a drill-down request, if one was sent, as the server would (the fixtures' invoices, filtered). */
function answerDrill(http: HttpTestingController): void {
  for (const request of http.match((r) => r.url.startsWith(RECEIVABLE_INVOICES_URL))) {
    const query = Object.fromEntries(new URL(request.request.url, 'http://x').searchParams);
    request.flush(drillAnswer(drillFromParams(query)));
  }
}

async function settle(): Promise<void> {
  TestBed.inject(ApplicationRef).tick();
  await TestBed.inject(ApplicationRef).whenStable();
  TestBed.inject(ApplicationRef).tick();
}

function tableText(html: HTMLElement, caption: string): string[][] {
  const table = [...html.querySelectorAll('table')].find((t) => t.caption?.textContent?.includes(caption));
  return [...(table?.querySelectorAll('tbody tr') ?? [])].map((row) =>
    [...row.querySelectorAll('th, td')].map((cell) => cell.textContent?.trim() ?? ''),
  );
}

describe('Cash', { timeout: 20_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('puts every charted figure in a table beside its chart', async () => {
    const { html } = await open('/', OWNER_JOBS);
    const canvases = [...html().querySelectorAll('canvas')];
    expect(canvases).toHaveLength(3);
    for (const canvas of canvases) {
      expect(canvas.getAttribute('role')).toBe('img');
      expect(canvas.getAttribute('aria-label')).toContain('table beside it');
    }
    const owed = tableText(html(), 'Owed as of');
    expect(owed.map((row) => row.slice(0, 2))).toEqual([
      ['Not yet due', '$1,200.00'],
      ['1–30 days late', '$0.00'],
      ['31–60 days late', '$2,450.00'],
      ['61–90 days late', '$0.00'],
      ['Over 90 days late', '$300.00'],
    ]);
    expect(html().textContent).toContain('Retainage held, not yet due$640.00');
    expect(tableText(html(), 'Received in the last 12 months')[10]).toEqual(['Nov 2026', '$5,200.00 (3)', '−$200.00 (1)', '$5,000.00']);
    const weeks = tableText(html(), 'Expected by week');
    expect(weeks[1]).toEqual(['Dec 7, 2026', '$0.00', '$1,800.00', '$150.00', '$1,950.00']);
    expect(html().textContent).toContain('Later than 13 weeks$0.00$900.00$0.00$900.00');
    expect(html().textContent).toContain('Your own odds for this stage');
  });

  it('drills into one age down to its invoices, with links to the invoice, client and job', async () => {
    const { html, http } = await open('/', OWNER_JOBS);
    const button = [...html().querySelectorAll('button')].find(
      (b) => b.textContent?.replace(/\s+/g, ' ').trim() === 'Invoices 31–60 days late',
    );
    expect(button).toBeDefined();
    button?.click();
    await new Promise((resolve) => setTimeout(resolve)); // the address bar changes, then the request goes
    TestBed.inject(ApplicationRef).tick();
    // the drill-down asks for that age's invoices only; the figures are not asked for again
    http.expectNone((request) => request.url === '/api/cash/receivables');
    const asked = http.expectOne((request) => request.url.startsWith(RECEIVABLE_INVOICES_URL));
    expect(asked.request.url).toBe('/api/cash/receivables/invoices?age=31-60');
    asked.flush(drillAnswer({ age: '31-60', clientId: null, asOf: null }));
    await settle();
    expect(html().querySelector('#drill-heading')?.textContent).toContain('Invoices 31–60 days late (1)');
    const drill = html().querySelector('.drill');
    const links = [...(drill?.querySelectorAll('a') ?? [])].map((a) => a.getAttribute('href'));
    expect(links).toEqual(['/billing/invoices/inv-7', '/clients/c-1', '/jobs/job-1']);
    expect(drill?.textContent).toContain('35 days late');
    expect(button?.getAttribute('aria-pressed')).toBe('true');
  });

  it('says when only the clients owing most are listed, and asks for all of them on request', async () => {
    const { html, http } = await open('/', OWNER_JOBS, true, { ...RECEIVABLES, clientCount: 30 });
    const more = html().querySelector('.clients-more');
    expect(more?.textContent?.replace(/\s+/g, ' ')).toContain('The 2 clients who owe the most, of 30 who owe you.');
    const showAll = [...(more?.querySelectorAll('button') ?? [])].find((b) => b.textContent?.includes('Show all 30 clients'));
    expect(showAll).toBeDefined();
    showAll?.click();
    TestBed.inject(ApplicationRef).tick();
    const asked = http.expectOne((request) => request.url === '/api/cash/receivables');
    expect(asked.request.params.get('clients')).toBe('all');
    asked.flush({ ...RECEIVABLES, clientCount: 2 });
    await settle();
    expect(html().querySelector('.clients-more')).toBeNull();
  });

  it('asks for the chosen day and opens a client drill-down from the address', async () => {
    const { html, asOfSent } = await open('/?asOf=2026-11-30&client=c-2', OWNER_JOBS);
    expect(asOfSent).toBe('2026-11-30');
    expect(html().querySelector('#drill-heading')?.textContent).toContain('Open invoices for Hollis Tea Rooms (2)');
  });

  it('shows margins to the owner, with "not known" where costs are missing', async () => {
    const { html } = await open('/', OWNER_JOBS);
    const text = html().textContent ?? '';
    expect(text).toContain('60.0%');
    expect(text).toContain('3 accepted of 5');
    expect(text).toContain('Margin, estimated');
    expect(text).toContain('$3,300.00 (37.5%)');
    expect(text).toContain('not known');
  });

  it('shows the office no margin columns at all', async () => {
    const { html } = await open('/', OFFICE_JOBS, false);
    const text = html().textContent ?? '';
    expect(text).toContain('Hall in lime plaster');
    expect(text).not.toContain('Margin');
    expect(text).not.toContain('margin');
  });

  it('offers each export as a download for the chosen days', async () => {
    const { html } = await open('/', OWNER_JOBS);
    const downloads = [...html().querySelectorAll('a[download]')].map((a) => a.getAttribute('href') ?? '');
    expect(downloads).toHaveLength(6);
    // the money owed, as of its day, first; then the exports for the chosen days
    expect(downloads[0]).toMatch(/^\/api\/cash\/exports\/receivables\.csv\?asOf=\d{4}-\d{2}-\d{2}$/);
    downloads.shift();
    expect(downloads.map((href) => href.split('?')[0])).toEqual([
      '/api/cash/exports/invoices.csv',
      '/api/cash/exports/payments.csv',
      '/api/cash/exports/refunds.csv',
      '/api/cash/exports/credit-notes.csv',
      '/api/cash/exports/clients.csv',
    ]);
    expect(downloads[0]).toMatch(/from=\d{4}-01-01&to=\d{4}-\d{2}-\d{2}$/);
  });
});
