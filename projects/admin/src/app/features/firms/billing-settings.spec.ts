import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { DEFAULT_BILLING_SETTINGS, type BillingSettings, type BillingSettingsView, type StaffRole } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { staffSession } from '../../shared/testing/staff-session';
import { Session } from '../../core/auth/session';
import { BillingSettingsPage } from './billing-settings';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

const VIEW: BillingSettingsView = { settings: DEFAULT_BILLING_SETTINGS, isDefault: true, currency: 'USD' };

async function render(role: StaffRole) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  TestBed.inject(Session).accept(staffSession(role));
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(BillingSettingsPage);
  fixture.detectChanges();
  http.expectOne('/api/firm/billing').flush(VIEW);
  await fixture.whenStable();
  return { fixture, http, host: fixture.nativeElement as HTMLElement };
}

// Rendering Material fields takes seconds in jsdom on a busy machine.
describe('BillingSettingsPage', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows the starting values, the example numbers and the deposit rule by name; the owner can save', async () => {
    const { host } = await render('owner');
    const text = host.textContent ?? '';
    expect(text).toContain('These are still the starting values.');
    expect(text).toContain('Numbers look like INV-0001');
    expect(text).toContain('Numbers look like CN-0001');
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="depositCapName"]')?.value).toBe('No deposit limit');
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="days"]')?.value).toBe('14');
    expect(text).toContain('Save billing settings');
  });

  it('drafts the deposit at acceptance by default; the owner can have it issued and e-mailed at once instead', async () => {
    const { fixture, http, host } = await render('owner');
    const group = host.querySelector('mat-radio-group[formcontrolname="depositAtAcceptance"]');
    expect(group?.textContent).toContain('Draft the deposit invoice for the office to check and issue');
    expect(group?.textContent).toContain('Issue the deposit invoice and e-mail it to the client as soon as they accept');
    const radios = [...(group?.querySelectorAll<HTMLInputElement>('input[type="radio"]') ?? [])];
    expect(radios.map((r) => r.checked)).toEqual([true, false]);
    expect(host.textContent).not.toContain('pay the deposit online straight away');

    radios[1].click();
    fixture.detectChanges();
    await fixture.whenStable();
    expect(host.textContent).toContain('the client can pay the deposit online straight away');
    host.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    const put = http.expectOne({ method: 'PUT', url: '/api/firm/billing' });
    expect((put.request.body as BillingSettings).depositAtAcceptance).toBe('issueAndSend');
    put.flush({ ...VIEW, settings: put.request.body as BillingSettings, isDefault: false });
    await fixture.whenStable();
  });

  it('lets the office read but not change', async () => {
    const { host } = await render('office');
    expect(host.textContent).toContain('Only the owner of the firm can change these settings.');
    expect(host.textContent).not.toContain('Save billing settings');
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="depositCapName"]')?.disabled).toBe(true);
  });
});
