import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SecondFactorEnrolment, SecondFactorStatus } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { Language } from '../../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import auth from '../../../../i18n/auth/en.json';
import authEs from '../../../../i18n/auth/es.json';
import { SecurityPage } from './security-page';

const ENROLMENT: SecondFactorEnrolment = {
  otpauthUri: 'otpauth://totp/Layerbook:ada%40example.com?secret=JBSWY3DPEHPK3PXP&issuer=Layerbook',
  qrDataUrl: 'data:image/png;base64,iVBORw0KGgo=',
  secretGroups: ['JBSW', 'Y3DP', 'EHPK', '3PXP'],
};
const ON: SecondFactorStatus = { enrolled: true, enrolledAt: '2026-11-02T09:00:00Z', recoveryCodesLeft: 7, firmRequires: false };

async function render(status: SecondFactorStatus, language: 'en' | 'es' = 'en') {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth: language === 'es' ? authEs : auth }, language),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  await TestBed.inject(Language).use(language);
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
    expect(host.textContent).toContain('On since November 2, 2026.');
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

  it('keeps turning off away while the firm requires it', async () => {
    const required = await render({ ...ON, firmRequires: true });
    expect(required.host.textContent).toContain('Your firm requires a second factor for owner and office.');
    expect(button(required.host, 'Turn off')).toBeUndefined();
  });

  it('starts setting one up only with the password, then shows what to add to the app', async () => {
    const { fixture, http, host, settle } = await render({ enrolled: false, enrolledAt: null, recoveryCodesLeft: 0, firmRequires: false });
    expect(host.textContent).toContain('Second factor is off');
    button(host, 'Set up a second factor')!.click();
    http.expectNone({ method: 'POST', url: '/api/auth/second-factor/enrolment' });
    const password = host.querySelector<HTMLInputElement>('input[formcontrolname="password"]')!;
    expect(password.type).toBe('password');
    expect(password.getAttribute('autocomplete')).toBe('current-password');
    password.value = 'not-my-password';
    password.dispatchEvent(new Event('input'));
    button(host, 'Set up a second factor')!.click();
    const wrong = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/enrolment' });
    expect(wrong.request.body).toEqual({ password: 'not-my-password' });
    wrong.flush(
      { title: 'That password is not right.', status: 400, errors: [{ field: 'password', message: 'That password is not right.' }] },
      { status: 400, statusText: 'Bad Request', headers: { 'content-type': 'application/problem+json' } },
    );
    await settle();
    expect(host.querySelector('mat-error')?.textContent).toContain('That password is not right.');
    expect(host.querySelector('img.qr')).toBeNull();

    password.value = 'my-own-password';
    password.dispatchEvent(new Event('input'));
    button(host, 'Set up a second factor')!.click();
    fixture.detectChanges();
    const right = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/enrolment' });
    expect(right.request.body).toEqual({ password: 'my-own-password' });
    right.flush(ENROLMENT);
    await settle();
    // The panel shows the set-up it was handed and starts no other.
    expect(host.querySelector<HTMLImageElement>('img.qr')?.getAttribute('src')).toBe(ENROLMENT.qrDataUrl);
    http.expectNone({ method: 'POST', url: '/api/auth/second-factor/enrolment' });
  });

  it("writes the date in the reader's language", async () => {
    const { host } = await render(ON, 'es');
    expect(host.textContent).toContain('Activado desde el 2 de noviembre de 2026.');
  });
});
