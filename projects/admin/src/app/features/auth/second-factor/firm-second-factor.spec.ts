import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SecondFactorStatus, StaffRole } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { staffSession } from '../../../shared/testing/staff-session';
import { Session } from '../../../core/auth/session';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import auth from '../../../../i18n/auth/en.json';
import { FirmSecondFactor } from './firm-second-factor';

async function render(role: StaffRole, status: SecondFactorStatus) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  TestBed.inject(Session).accept(staffSession(role));
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(FirmSecondFactor);
  fixture.detectChanges();
  http.expectOne('/api/auth/second-factor').flush(status);
  await fixture.whenStable();
  fixture.detectChanges();
  const host = fixture.nativeElement as HTMLElement;
  return { fixture, http, host, toggle: host.querySelector<HTMLButtonElement>('button[role="switch"]')! };
}

const OFF: SecondFactorStatus = { enrolled: true, enrolledAt: '2026-11-02T09:00:00Z', recoveryCodesLeft: 10, firmRequires: false };

describe('FirmSecondFactor', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('lets an owner with a second factor require one for owner and office', async () => {
    const { fixture, http, host, toggle } = await render('owner', OFF);
    expect(host.textContent).toContain('Require a second factor for everyone in the office');
    expect(toggle.getAttribute('aria-checked')).toBe('false');
    expect(toggle.disabled).toBe(false);
    toggle.click();
    const put = http.expectOne({ method: 'PUT', url: '/api/auth/second-factor/firm' });
    expect(put.request.body).toEqual({ required: true });
    put.flush({ ...OFF, firmRequires: true });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(toggle.getAttribute('aria-checked')).toBe('true');
  });

  it('sends an owner without one to set theirs up first', async () => {
    const { host, toggle } = await render('owner', { ...OFF, enrolled: false, enrolledAt: null, recoveryCodesLeft: 0 });
    expect(toggle.disabled).toBe(true);
    expect(host.textContent).toContain('Turn on your own second factor first');
    expect(host.querySelector('a')?.getAttribute('href')).toBe('/security');
  });

  it('shows the office the rule without letting them change it', async () => {
    const { host, toggle } = await render('office', { ...OFF, firmRequires: true });
    expect(toggle.disabled).toBe(true);
    expect(toggle.getAttribute('aria-checked')).toBe('true');
    expect(host.textContent).toContain('Only the owner can change this.');
  });
});
