import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SecondFactorStatus } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import auth from '../../../../i18n/auth/en.json';
import { SecurityPage } from './security-page';

const ON: SecondFactorStatus = { enrolled: true, enrolledAt: '2026-11-02T09:00:00Z', recoveryCodesLeft: 7, firmRequires: false };

async function render(status: SecondFactorStatus) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(SecurityPage);
  fixture.detectChanges();
  http.expectOne('/api/auth/second-factor').flush(status);
  await fixture.whenStable();
  fixture.detectChanges();
  const settle = async () => {
    await new Promise((resolve) => setTimeout(resolve, 0));
    fixture.detectChanges();
    await fixture.whenStable();
  };
  return { fixture, http, settle, host: fixture.nativeElement as HTMLElement };
}

const button = (host: HTMLElement, words: string) =>
  [...host.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes(words));

describe('SecurityPage', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('says the second factor is on, with the codes left; new codes are shown once', async () => {
    const { http, host, settle } = await render(ON);
    expect(host.textContent).toContain('Second factor is on');
    expect(host.textContent).toContain('Recovery codes left: 7.');
    // the password first: without it nothing is sent
    button(host, 'Make new recovery codes')!.click();
    http.expectNone({ method: 'POST', url: '/api/auth/second-factor/recovery-codes' });
    const password = host.querySelector<HTMLInputElement>('input[formcontrolname="password"]')!;
    expect(password.getAttribute('autocomplete')).toBe('current-password');
    password.value = 'my-own-password';
    password.dispatchEvent(new Event('input'));
    button(host, 'Make new recovery codes')!.click();
    const renew = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/recovery-codes' });
    expect(renew.request.body).toEqual({ password: 'my-own-password' });
    renew.flush({ codes: ['abcde-23456', 'fghjk-78923'] });
    // The status is read again behind the codes (a pending read keeps the fixture from settling).
    await new Promise((resolve) => setTimeout(resolve, 0));
    http.expectOne('/api/auth/second-factor').flush({ ...ON, recoveryCodesLeft: 10 });
    await settle();
    expect([...host.querySelectorAll('.codes li')].map((li) => li.textContent?.trim())).toEqual(['abcde-23456', 'fghjk-78923']);
  });

  it('turns it off with the password when the person chooses it', async () => {
    const { fixture, http, host, settle } = await render(ON);
    button(host, 'Use my password instead')!.click();
    await settle();
    const input = host.querySelector<HTMLInputElement>('input[formcontrolname="proof"]')!;
    expect(input.type).toBe('password');
    expect(input.getAttribute('autocomplete')).toBe('current-password');
    input.value = 'my-own-password';
    input.dispatchEvent(new Event('input'));
    host.querySelectorAll('form')[1].dispatchEvent(new Event('submit'));
    fixture.detectChanges();
    const off = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/turn-off' });
    expect(off.request.body).toEqual({ password: 'my-own-password' });
    off.flush({ enrolled: false, enrolledAt: null, recoveryCodesLeft: 0, firmRequires: false } satisfies SecondFactorStatus);
    await settle();
    expect(host.textContent).toContain('Second factor is off');
  });

  it('keeps turning off away while the firm requires it, and offers to set one up when off', async () => {
    const required = await render({ ...ON, firmRequires: true });
    expect(required.host.textContent).toContain('Your firm requires a second factor for owner and office.');
    expect(button(required.host, 'Turn off')).toBeUndefined();
    TestBed.resetTestingModule();
    const off = await render({ enrolled: false, enrolledAt: null, recoveryCodesLeft: 0, firmRequires: false });
    expect(button(off.host, 'Set up a second factor')).toBeDefined();
  });
});
