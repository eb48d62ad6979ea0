import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { DEFAULT_BILLING_SETTINGS, type BillingSettingsView, type StaffRole } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { Session } from '../../core/auth/session';
import { BillingSettingsPage } from './billing-settings';

const VIEW: BillingSettingsView = { settings: DEFAULT_BILLING_SETTINGS, isDefault: true, currency: 'USD' };

async function render(role: StaffRole) {
  TestBed.configureTestingModule({
    providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  TestBed.inject(Session).accept({
    user: { id: 'u1', name: 'Ada', email: 'ada@example.com', role, firmId: 'f1', firmName: 'Fernhollow' },
    csrfToken: 't',
  });
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

  it('lets the office read but not change', async () => {
    const { host } = await render('office');
    expect(host.textContent).toContain('Only the owner of the firm can change these settings.');
    expect(host.textContent).not.toContain('Save billing settings');
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="depositCapName"]')?.disabled).toBe(true);
  });
});
