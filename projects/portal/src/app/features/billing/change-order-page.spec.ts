import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter } from '@angular/router';
import type { PortalChangeOrder } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import layout from '../../../i18n/layout/en.json';
import problems from '../../../i18n/problems/en.json';
import proposals from '../../../i18n/proposals/en.json';
import { ChangeOrderDecisionForm } from './change-order-decision-form';
import { ChangeOrderPage } from './change-order-page';

/** An invented change order as the API answers it. */
const changeOrder = (over: Partial<PortalChangeOrder> = {}): PortalChangeOrder => ({
  id: 'co-1',
  jobId: 'j-1',
  number: 2,
  title: 'Venetian niche',
  status: 'sent',
  currency: 'USD',
  price: '1000.00',
  tax: '82.50',
  amount: '1082.50',
  sentAt: '2026-03-01T15:00:00Z',
  decidedAt: null,
  jobTitle: 'Dining room plaster',
  description: '',
  pricingKind: 'lumpSum',
  pricing: { kind: 'lumpSum', price: '1000.00' },
  engine: null,
  signedName: null,
  clientComment: '',
  contractSumBefore: '10000.00',
  contractSumAfter: '11082.50',
  taxNote: null,
  timeZone: 'America/New_York',
  ...over,
});

async function open(answer: PortalChangeOrder) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ billing, proposals, layout, problems, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const fixture = TestBed.createComponent(ChangeOrderPage);
  document.body.appendChild(fixture.nativeElement as HTMLElement);
  fixture.componentRef.setInput('id', 'co-1');
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController).expectOne('/api/portal/change-orders/co-1').flush(answer);
  await fixture.whenStable();
  fixture.detectChanges();
  return { fixture, html: fixture.nativeElement as HTMLElement };
}

describe('a change order in the portal', () => {
  it('says when it was approved as the firm’s day and time, not the server’s or the browser’s', async () => {
    // 02:30 on March 4 in UTC is 6:30 PM on March 3 in Los Angeles
    const { fixture, html } = await open(
      changeOrder({ status: 'approved', signedName: 'Edwina Marl', decidedAt: '2026-03-04T02:30:00Z', timeZone: 'America/Los_Angeles' }),
    );
    const said = html.querySelector('[role=status]')?.textContent ?? '';
    expect(said).toContain('March 3, 2026');
    expect(said).toContain('6:30');
    fixture.nativeElement.remove();
  });

  it('after an answer, moves focus to it, said in a status region that was there, empty, before', async () => {
    const { fixture, html } = await open(changeOrder());
    const outcome = html.querySelector<HTMLElement>('[role=status]')!;
    expect(outcome.textContent?.trim()).toBe('');
    const form = fixture.debugElement.query(By.directive(ChangeOrderDecisionForm)).componentInstance as ChangeOrderDecisionForm;
    form.decided.emit(changeOrder({ status: 'approved', signedName: 'Edwina Marl', decidedAt: '2026-03-04T15:30:00Z' }));
    await vi.waitFor(() => {
      fixture.detectChanges();
      expect(document.activeElement).toBe(outcome);
    });
    expect(html.querySelector('[role=status]')).toBe(outcome);
    expect(outcome.textContent).toContain('Edwina Marl');
    expect(html.querySelector('lb-change-order-decision')).toBeNull();
    fixture.nativeElement.remove();
  });
});
