import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import auth from '../../../i18n/auth/en.json';
import problems from '../../../i18n/problems/en.json';
import { Session } from '../../core/auth/session';
import { wordsAt } from '../../testing/words';
import { SignIn } from './sign-in';

function open() {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ auth, problems, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(SignIn);
  document.body.appendChild(fixture.nativeElement as HTMLElement);
  TestBed.inject(ApplicationRef).tick();
  return { fixture, http, html: fixture.nativeElement as HTMLElement };
}

describe('the sign-in page', () => {
  it('tells a client signed out because the firm turned their access off why, naming the firm', async () => {
    const { fixture, http, html } = open();
    const checked = TestBed.inject(Session).load();
    http.expectOne('/api/portal/session').flush({ client: null, csrfToken: 't', accessOff: { firmName: 'Quillfeather' } });
    await checked;
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role=alert] span')?.textContent?.trim()).toBe(
      wordsAt({ auth }, 'auth.signIn.accessOff', { firm: 'Quillfeather' }),
    );
  });

  it('moves focus to the note saying the link was sent, in a status region that was there, empty, before', async () => {
    const { fixture, http, html } = open();
    const status = html.querySelector<HTMLElement>('[role=status]');
    expect(status?.textContent?.trim()).toBe('');
    const input = html.querySelector<HTMLInputElement>('input[type=email]')!;
    input.value = 'ada@example.com';
    input.dispatchEvent(new Event('input'));
    html.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    http.expectOne('/api/portal/auth/link').flush({ detail: 'on its way' }, { status: 202, statusText: 'Accepted' });
    await fixture.whenStable();
    fixture.detectChanges();
    await vi.waitFor(() => expect(document.activeElement).toBe(status));
    expect(html.querySelector('[role=status]')).toBe(status);
    expect(status?.textContent).toContain('ada@example.com');
    fixture.nativeElement.remove();
  });
});
