import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { StaffSession } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import auth from '../../../../i18n/auth/en.json';
import { staffSession } from '../../../shared/testing/staff-session';
import { urlAfterSignIn } from '../../../core/auth/guards';
import { SecondFactorCodeStep } from './code-step';

const SIGNED_IN: StaffSession = { ...staffSession('owner', 't2'), secondFactor: null };

async function render(next?: string) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const router = TestBed.inject(Router);
  const navigate = vi.spyOn(router, 'navigateByUrl').mockResolvedValue(true);
  const fixture = TestBed.createComponent(SecondFactorCodeStep);
  if (next) fixture.componentRef.setInput('next', next);
  fixture.detectChanges();
  await fixture.whenStable();
  return { fixture, navigate, http: TestBed.inject(HttpTestingController), host: fixture.nativeElement as HTMLElement };
}

/** Lets the answer's promise chain run (the HTTP answer, the session, the navigation) and redraws. */
async function settle(fixture: Awaited<ReturnType<typeof render>>['fixture']) {
  await new Promise((resolve) => setTimeout(resolve, 0));
  fixture.detectChanges();
  await fixture.whenStable();
}

async function typeAndSend(fixture: Awaited<ReturnType<typeof render>>['fixture'], host: HTMLElement, value: string) {
  const input = host.querySelector<HTMLInputElement>('input[formcontrolname="code"]')!;
  input.value = value;
  input.dispatchEvent(new Event('input'));
  host.querySelector<HTMLFormElement>('form')!.dispatchEvent(new Event('submit'));
  fixture.detectChanges();
  await fixture.whenStable();
}

describe('urlAfterSignIn', () => {
  it.each([
    [null, '/today', '/today'],
    [null, '/jobs/7', '/jobs/7'],
    ['code', '/today', '/sign-in/code'],
    ['code', '/jobs/7', '/sign-in/code?next=%2Fjobs%2F7'],
    ['enrol', '/today', '/sign-in/set-up'],
  ] as const)('step %s, headed for %s: %s', (step, next, url) => {
    const session: StaffSession = { user: null, csrfToken: 't', secondFactor: step ? { step, expiresAt: '2026-12-03T10:05:00Z' } : null };
    expect(urlAfterSignIn(session, next)).toBe(url);
  });
});

// Rendering Material fields takes seconds in jsdom on a busy machine.
describe('SecondFactorCodeStep', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('asks for the app code with a labelled numeric one-time-code field and sends the digits alone', async () => {
    const { fixture, host, http, navigate } = await render('/jobs/7');
    const input = host.querySelector<HTMLInputElement>('input[formcontrolname="code"]')!;
    expect(input.getAttribute('autocomplete')).toBe('one-time-code');
    expect(input.getAttribute('inputmode')).toBe('numeric');
    expect(host.querySelector('mat-label')?.textContent).toContain('Code from your app');

    await typeAndSend(fixture, host, '123 456');
    const sent = http.expectOne({ method: 'POST', url: '/api/auth/second-factor' });
    expect(sent.request.body).toEqual({ code: '123456' });
    sent.flush(SIGNED_IN);
    await settle(fixture);
    expect(navigate).toHaveBeenCalledWith('/jobs/7');
  });

  it('refuses anything but six digits before sending, and shows the server’s refusal by the field', async () => {
    const { fixture, host, http } = await render();
    await typeAndSend(fixture, host, '12345');
    http.expectNone('/api/auth/second-factor');
    expect(host.textContent).toContain('Enter the 6 digits your app shows.');

    await typeAndSend(fixture, host, '654321');
    http
      .expectOne('/api/auth/second-factor')
      .flush(
        { type: 'about:blank', title: 'x', status: 400, errors: [{ field: 'code', message: 'That code is not right.' }] },
        { status: 400, statusText: 'Bad Request' },
      );
    await settle(fixture);
    expect(host.textContent).toContain('That code is not right.');
  });

  it('takes a recovery code in a plain text field', async () => {
    const { fixture, host, http } = await render();
    const switcher = [...host.querySelectorAll<HTMLButtonElement>('button[type="button"]')].find((b) =>
      b.textContent?.includes('recovery code'),
    );
    switcher!.click();
    fixture.detectChanges();
    await fixture.whenStable();
    const input = host.querySelector<HTMLInputElement>('input[formcontrolname="code"]')!;
    expect(input.getAttribute('inputmode')).toBeNull();
    expect(host.querySelector('mat-label')?.textContent).toContain('Recovery code');
    await typeAndSend(fixture, host, ' abcde-23456 ');
    const sent = http.expectOne('/api/auth/second-factor');
    expect(sent.request.body).toEqual({ code: 'abcde-23456' });
    sent.flush(SIGNED_IN);
    await settle(fixture);
  });
});
