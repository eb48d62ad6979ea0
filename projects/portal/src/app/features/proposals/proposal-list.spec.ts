import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ItemList, PortalProposalSummary } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { ProposalList } from './proposal-list';

/** An invented project: accepted, with one change waiting for the client and one approved deduction. */
const projects: ItemList<PortalProposalSummary> = {
  items: [
    {
      estimateId: 'est-1',
      title: 'Stair hall, lime plaster',
      siteAddress: '14 Quarry Lane, Millbrook',
      latest: { id: 'ver-1', version: 2, status: 'accepted', expiresOn: '2026-12-20', isExpired: true, sentAt: '2026-11-20T10:00:00Z' },
      changeOrders: [
        { id: 'co-2', number: 2, title: 'Glaze on the landing ceiling', status: 'sent', amount: '1082.50', currency: 'USD' },
        { id: 'co-1', number: 1, title: 'Leave out the niche', status: 'approved', amount: '-400.00', currency: 'USD' },
      ],
    },
  ],
};

async function render(list: ItemList<PortalProposalSummary>): Promise<HTMLElement> {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ proposals, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const fixture = TestBed.createComponent(ProposalList);
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController).expectOne('/api/portal/proposals').flush(list);
  await fixture.whenStable();
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

const sent = (isExpired: boolean): ItemList<PortalProposalSummary> => ({
  items: [
    {
      ...projects.items[0],
      latest: { id: 'ver-3', version: 1, status: 'sent', expiresOn: '2026-12-20', isExpired, sentAt: '2026-11-20T10:00:00Z' },
      changeOrders: [],
    },
  ],
});

describe('the projects list', () => {
  it('says a sent proposal past its day has expired, not that it waits for an answer', async () => {
    const line = (await render(sent(true))).querySelector('.project p:not(.site)')?.textContent?.replace(/\s+/g, ' ').trim();
    expect(line).toBe(
      'Proposal, version 1: Expired · the offer ended on December 20, 2026; ask the firm for a new one if you still want the work',
    );
  });

  it('a sent proposal still standing waits for the answer', async () => {
    const line = (await render(sent(false))).querySelector('.project p:not(.site)')?.textContent?.replace(/\s+/g, ' ').trim();
    expect(line).toBe('Proposal, version 1: Waiting for your answer · the offer stands until December 20, 2026');
  });

  it('names each change order on the job with where it stands and what it does to the contract, linked to its page', async () => {
    TestBed.configureTestingModule({
      providers: [provideTestI18n({ proposals, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(ProposalList);
    TestBed.inject(ApplicationRef).tick();
    TestBed.inject(HttpTestingController).expectOne('/api/portal/proposals').flush(projects);
    await fixture.whenStable();
    fixture.detectChanges();
    const html = fixture.nativeElement as HTMLElement;
    const orders = [...html.querySelectorAll('.orders li')].map((li) => li.textContent?.replace(/\s+/g, ' ').trim());
    expect(orders).toEqual([
      'Change order #2: Glaze on the landing ceiling · waiting for your answer · adds $1,082.50',
      'Change order #1: Leave out the niche · approved · takes $400.00 off',
    ]);
    expect([...html.querySelectorAll<HTMLAnchorElement>('.orders a')].map((a) => a.getAttribute('href'))).toEqual([
      '/change-orders/co-2',
      '/change-orders/co-1',
    ]);
  });
});
