import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ItemList, JobSheetSummary } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import en from '../../../../i18n/sheet/en.json';
import { SheetList } from './sheet-list';
import { sheetSummaries as jobs } from './sheet-fixtures';

async function render(answer: ItemList<JobSheetSummary>) {
  TestBed.configureTestingModule({
    providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), provideTestI18n({ sheet: en })],
  });
  const fixture = TestBed.createComponent(SheetList);
  fixture.detectChanges();
  TestBed.inject(HttpTestingController).expectOne('/api/jobs/sheets').flush(answer);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

describe('SheetList', () => {
  it('lists each job with its address, dates and layers done, linking to its sheet', async () => {
    const host = await render(jobs);
    const links = Array.from(host.querySelectorAll('a.job'));
    expect(links.map((a) => a.getAttribute('href'))).toEqual(['/sheets/job-1', '/sheets/job-2']);
    const first = (links[0].textContent ?? '').replace(/\s+/g, ' ');
    expect(first).toContain('14 Orchard Lane, Millbrook');
    expect(first).toContain('Dec 7, 2026 to Dec 11, 2026');
    expect(first).toContain('In progress');
    expect(first).toContain('3 of 8 layers done');
    expect(links[1].textContent).toContain('Dates not set yet');
  });

  it('says when there is no job to work on', async () => {
    const host = await render({ items: [] });
    expect(host.textContent).toContain('No jobs scheduled or in progress.');
  });
});
