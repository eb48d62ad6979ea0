import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { PortalProposal, SnapshotOption } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import proposals from '../../../i18n/proposals/en.json';
import { AcceptanceForm } from './acceptance-form';
import { proposalUrl } from './proposal-api';
import { SNAPSHOT } from './proposal-fixtures';

/** An invented option: 10,000.00 in three payments, the deposit first. */
const option: SnapshotOption = {
  id: 'A',
  label: 'Polished lime',
  price: '9259.26',
  tax: '740.74',
  total: '10000.00',
  schedule: { startDate: '2027-01-11', finishDate: '2027-01-22', workingDays: 10, milestones: [] },
  payments: [
    {
      id: 'deposit',
      label: 'Deposit on acceptance',
      role: 'deposit',
      trigger: { kind: 'acceptance' },
      percent: 25,
      amount: '2500.00',
      expectedOn: null,
    },
    {
      id: 'base',
      label: 'Progress payment',
      role: 'milestone',
      trigger: { kind: 'walkthrough' },
      percent: 40,
      amount: '4000.00',
      expectedOn: '2027-01-15',
    },
    {
      id: 'final',
      label: 'Final payment',
      role: 'final',
      trigger: { kind: 'walkthrough' },
      percent: 35,
      amount: '3500.00',
      expectedOn: '2027-01-22',
    },
  ],
  isDepositCapped: false,
};

const proposal: PortalProposal = {
  id: 'ver-1',
  version: 1,
  status: 'sent',
  expiresOn: '2027-01-31',
  isExpired: false,
  isLatest: true,
  snapshot: {
    ...SNAPSHOT,
    options: [option],
    addOns: [{ id: 'border', label: 'Stencilled border', price: '925.93', tax: '74.07', total: '1000.00' }],
  },
  decidedAt: null,
  timeZone: 'America/New_York',
  acceptedVariantId: null,
  acceptedAddOnIds: [],
  signedName: null,
  clientComment: '',
};

async function render() {
  TestBed.configureTestingModule({
    imports: [AcceptanceForm],
    providers: [provideTestI18n({ proposals, common }), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(AcceptanceForm);
  fixture.componentRef.setInput('proposal', proposal);
  await fixture.whenStable();
  const html = fixture.nativeElement as HTMLElement;
  const settle = async () => {
    fixture.detectChanges();
    await fixture.whenStable();
  };
  return { fixture, html, settle };
}

const text = (el: Element | null) => (el?.textContent ?? '').replace(/\s+/g, ' ').trim();

describe('accepting with add-ons', () => {
  it('shows the total being agreed and the payments the add-on grows, then sends the add-on with the signature', async () => {
    const { html, settle } = await render();
    const [radio] = Array.from(html.querySelectorAll<HTMLInputElement>('mat-radio-button input'));
    radio.click();
    await settle();
    expect(text(html.querySelector('.agreed-total'))).toBe('Total you are agreeing to: $10,000.00');
    expect(html.querySelector('.payments')).toBeNull();

    const addOn = html.querySelector<HTMLInputElement>('mat-checkbox input[type=checkbox]')!;
    expect(text(html.querySelector('mat-checkbox'))).toBe('Stencilled border — $1,000.00');
    addOn.click();
    await settle();
    expect(text(html.querySelector('.agreed-total'))).toBe('Total you are agreeing to: $11,000.00');
    // The deposit as shown; 8,500.00 split 4,000 : 3,500 by largest remainder (common practice, no source).
    expect(Array.from(html.querySelectorAll('.payments li')).map((li) => Array.from(li.children).map(text).join(' '))).toEqual([
      'Deposit on acceptance $2,500.00',
      'Progress payment $4,533.33',
      'Final payment $3,966.67',
    ]);

    const name = html.querySelector<HTMLInputElement>('input[autocomplete=name]')!;
    name.value = 'Edwina Marl';
    name.dispatchEvent(new Event('input'));
    const consent = Array.from(html.querySelectorAll<HTMLInputElement>('mat-checkbox input[type=checkbox]')).at(-1)!;
    consent.click();
    await settle();
    html.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    const req = TestBed.inject(HttpTestingController).expectOne(`${proposalUrl('ver-1')}/accept`);
    expect(req.request.body).toEqual({ variantId: 'A', addOnIds: ['border'], signedName: 'Edwina Marl', consent: true });
  });
});
