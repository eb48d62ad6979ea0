import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { AuditPage } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import audit from '../../../i18n/audit/en.json';
import ui from '../../../i18n/ui/en.json';
import { AUDIT_URL, Activity } from './activity';
import { EMPTY_PAGE, FIRST_PAGE, INVOICE_ID, OFFICE_ID, SECOND_PAGE, TEAM } from './activity-fixtures';

async function settle(): Promise<void> {
  TestBed.inject(ApplicationRef).tick();
  await TestBed.inject(ApplicationRef).whenStable();
  TestBed.inject(ApplicationRef).tick();
}

/** Opens the page at `url`, answers the team and the first page of activity, and hands back what the list asked. */
async function open(url: string, page: AuditPage) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ audit, ui }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  await TestBed.inject(Router).navigateByUrl(url);
  const fixture = TestBed.createComponent(Activity);
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne('/api/team/members').flush(TEAM);
  const first = http.expectOne((r) => r.url === AUDIT_URL);
  const asked = Object.fromEntries(first.request.params.keys().map((k) => [k, first.request.params.get(k)]));
  first.flush(page);
  await settle();
  return { http, html: fixture.nativeElement as HTMLElement, asked };
}

const entries = (html: HTMLElement) => [...html.querySelectorAll('.entry')].map((li) => li.textContent?.replace(/\s+/g, ' ').trim() ?? '');

describe('Activity', { timeout: 20_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('lists when, who, what and which record, newest first, with a link to the record', async () => {
    const { html, asked } = await open('/', FIRST_PAGE);
    expect(asked).toEqual({ limit: '50' });
    const rows = entries(html);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toContain('Priya Ashdown');
    expect(rows[0]).toContain('priya@fern.example');
    expect(rows[0]).toContain('Issued invoice INV-0007 for 1200.00, due 2026-12-31');
    expect(rows[0]).toContain('invoice.issued');
    expect(rows[1]).toContain('Automatic');
    expect(html.querySelector(`a[href="/billing/invoices/${INVOICE_ID}"]`)?.textContent?.trim()).toBe('Invoice');
    expect(html.querySelector('time')?.getAttribute('datetime')).toBe('2026-12-02T15:04:00.000Z');
  });

  it('loads the next page after the last one, keeping the filters', async () => {
    const { html, http } = await open(`/?kind=invoices&person=${OFFICE_ID}`, FIRST_PAGE);
    const more = [...html.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Load more');
    expect(more).toBeDefined();
    more!.click();
    const next = http.expectOne((r) => r.url === AUDIT_URL && r.params.get('after') === 'cursor-2');
    expect(next.request.params.get('kind')).toBe('invoices');
    expect(next.request.params.get('person')).toBe(OFFICE_ID);
    next.flush(SECOND_PAGE);
    await settle();
    expect(entries(html)).toHaveLength(3);
    expect(entries(html)[2]).toContain('Signed in with the second factor');
    expect([...html.querySelectorAll('button')].some((b) => b.textContent?.trim() === 'Load more')).toBe(false);
  });

  it('asks the server with the filters from the address bar, a pasted page address read as its record id', async () => {
    const { asked } = await open(`/?from=2026-11-01&to=2026-11-30&record=%2Fbilling%2Finvoices%2F${INVOICE_ID}`, FIRST_PAGE);
    expect(asked).toEqual({ limit: '50', from: '2026-11-01', to: '2026-11-30', record: INVOICE_ID });
  });

  it('says when nothing has happened yet, and when nothing matches', async () => {
    const empty = await open('/', EMPTY_PAGE);
    expect(empty.html.querySelector('.none')?.textContent?.trim()).toBe(audit.activity.noneYet);
    TestBed.resetTestingModule();
    const none = await open('/?kind=voids', EMPTY_PAGE);
    expect(none.html.querySelector('.none')?.textContent?.trim()).toBe(audit.activity.noneMatch);
    expect([...none.html.querySelectorAll('button')].map((b) => b.textContent?.trim())).toContain('Clear filters');
  });

  it('shows a wrong range beside its field and offers the download with what it holds', async () => {
    const { html } = await open('/?from=2026-12-02&to=2026-12-01', FIRST_PAGE);
    expect(html.querySelector('.field-error')?.textContent?.trim()).toBe('The last day is before the first.');
    const download = html.querySelector('a[download]');
    expect(download?.getAttribute('href')).toBe('/api/firm/export');
    expect(download?.textContent?.trim()).toContain('Download all firm data');
    expect(html.querySelector('.download p')?.textContent).toContain('Passwords and sign-in secrets are never included');
  });
});
