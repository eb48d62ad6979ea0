import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SecondFactorEnrolled, SecondFactorEnrolment } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import auth from '../../../../i18n/auth/en.json';
import { EnrolPanel } from './enrol-panel';
import { RecoveryCodeList } from './recovery-code-list';

const ENROLMENT: SecondFactorEnrolment = {
  otpauthUri: 'otpauth://totp/Layerbook:ada%40example.com?secret=JBSWY3DPEHPK3PXPJBSWY3DPEHPK3PXP&issuer=Layerbook',
  qrDataUrl: 'data:image/png;base64,iVBORw0KGgo=',
  secretGroups: ['JBSW', 'Y3DP', 'EHPK', '3PXP', 'JBSW', 'Y3DP', 'EHPK', '3PXP'],
};
const CODES = [
  'abcde-23456',
  'fghjk-78923',
  'mnpqr-34567',
  'stuvw-45678',
  'xyzab-56789',
  'cdefg-67892',
  'hjkmn-78934',
  'pqrst-89235',
  'uvwxy-92346',
  'zabcd-23457',
];

function setUp() {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  return TestBed.inject(HttpTestingController);
}

describe('EnrolPanel', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows the QR code with words for it and the key in groups; the first code turns it on and hands over the recovery codes', async () => {
    const http = setUp();
    const fixture = TestBed.createComponent(EnrolPanel);
    let codes: readonly string[] | null = null;
    fixture.componentInstance.enrolled.subscribe((c) => (codes = c));
    fixture.detectChanges();
    await fixture.whenStable();
    http.expectOne({ method: 'POST', url: '/api/auth/second-factor/enrolment' }).flush(ENROLMENT);
    await fixture.whenStable();
    fixture.detectChanges();
    const host = fixture.nativeElement as HTMLElement;
    const img = host.querySelector<HTMLImageElement>('img.qr')!;
    expect(img.getAttribute('src')).toBe(ENROLMENT.qrDataUrl);
    expect(img.getAttribute('alt')).toBe('QR code to add Layerbook to your authenticator app');
    expect([...host.querySelectorAll('.secret code')].map((c) => c.textContent?.trim())).toEqual(ENROLMENT.secretGroups);
    expect(host.querySelector('.secret')?.getAttribute('translate')).toBe('no');
    const input = host.querySelector<HTMLInputElement>('input[formcontrolname="code"]')!;
    expect(input.getAttribute('autocomplete')).toBe('one-time-code');
    expect(input.getAttribute('inputmode')).toBe('numeric');

    input.value = '246810';
    input.dispatchEvent(new Event('input'));
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    const confirm = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/enrolment/confirm' });
    expect(confirm.request.body).toEqual({ code: '246810' });
    confirm.flush({ user: null, csrfToken: 't', secondFactor: null, codes: CODES } satisfies SecondFactorEnrolled);
    await fixture.whenStable();
    expect(codes).toEqual(CODES);
  });
});

describe('RecoveryCodeList', { timeout: 30_000 }, () => {
  it('lists the codes untranslated and goes on only once the person says they kept them', async () => {
    setUp();
    const fixture = TestBed.createComponent(RecoveryCodeList);
    fixture.componentRef.setInput('codes', CODES);
    let done = 0;
    fixture.componentInstance.done.subscribe(() => done++);
    fixture.detectChanges();
    await fixture.whenStable();
    const host = fixture.nativeElement as HTMLElement;
    expect([...host.querySelectorAll('.codes li')].map((li) => li.textContent?.trim())).toEqual(CODES);
    expect(host.querySelector('.codes')?.getAttribute('translate')).toBe('no');
    const goOn = [...host.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes('Continue'))!;
    expect(goOn.disabled).toBe(true);
    host.querySelector<HTMLInputElement>('input[type="checkbox"]')!.click();
    fixture.detectChanges();
    await fixture.whenStable();
    expect(goOn.disabled).toBe(false);
    goOn.click();
    expect(done).toBe(1);
  });
});
