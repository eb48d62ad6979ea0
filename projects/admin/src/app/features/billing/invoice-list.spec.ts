import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { INVOICE_LIST_FILTERS, INVOICE_LIST_FILTER_LABELS } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { issuedSummary } from './invoice-fixtures';
import { InvoiceList } from './invoice-list';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

const draft = { ...issuedSummary, id: 'inv-2', number: null, status: 'draft' as const, isOverdue: false, origin: 'queue' as const };

async function render(hasDrafts: boolean) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n(officeWords), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const fixture = TestBed.createComponent(InvoiceList);
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  http.expectOne('/api/invoices?filter=all&limit=50').flush({ items: [issuedSummary, draft], nextCursor: 'c1' });
  http.expectOne('/api/invoices?filter=drafts&limit=1').flush({ items: hasDrafts ? [draft] : [], nextCursor: null });
  await fixture.whenStable();
  fixture.detectChanges();
  return { html: fixture.nativeElement as HTMLElement, http };
}

describe('the invoice list', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('leads with "To review" while drafts wait', async () => {
    const chips = async (hasDrafts: boolean) =>
      [...(await render(hasDrafts)).html.querySelectorAll('mat-chip-option')].map((c) => c.textContent?.trim());
    // the contract's filters in its order ('Refunded' among them once the API lists refunded invoices apart)
    const labels = INVOICE_LIST_FILTERS.map((f) => INVOICE_LIST_FILTER_LABELS[f]);
    const withDrafts = await chips(true);
    expect(withDrafts).toEqual(['To review', ...labels.filter((l) => l !== 'To review')]);
    expect(withDrafts.slice(0, 5)).toEqual(['To review', 'All', 'Open', 'Overdue', 'Paid']);
    TestBed.resetTestingModule();
    const without = await chips(false);
    expect(without).toEqual(labels);
    expect(without.slice(0, 2)).toEqual(['All', 'To review']);
    expect(without.at(-1)).toBe('Void');
  });

  it('shows numbers or "Draft", overdue in words with an icon, in a named keyboard-reachable region, and offers more', async () => {
    const { html } = await render(true);
    const region = html.querySelector('.table-wrap');
    expect(region?.getAttribute('role')).toBe('region');
    expect(region?.getAttribute('tabindex')).toBe('0');
    expect(region?.getAttribute('aria-label')).toBe('Invoices');
    const rows = [...html.querySelectorAll('tbody tr')].map((r) => r.textContent?.replace(/\s+/g, ' ').trim());
    expect(rows[0]).toContain('INV-0007');
    expect(rows[0]).toContain('alarmOverdue');
    expect(rows[0]).toContain('Stage payment');
    expect(rows[0]).toContain('$4,200.00');
    expect(rows[1]).toContain('Draft');
    expect(rows[1]).toContain('Drafted by the schedule');
    expect(html.querySelector('a[href="/billing/invoices/inv-1"]')).not.toBeNull();
    expect(html.querySelectorAll('.cards li').length).toBe(2);
    expect([...html.querySelectorAll('button')].map((b) => b.textContent?.trim())).toContain('Show more invoices');
  });
});
