import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { InvitationPreview } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import auth from '../../../i18n/auth/en.json';
import ui from '../../../i18n/ui/en.json';
import { AcceptInvitation } from './accept-invitation';

const TOKEN = 'a'.repeat(43);

async function render(preview: InvitationPreview) {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ auth, common, ui }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(AcceptInvitation);
  fixture.componentRef.setInput('token', TOKEN);
  fixture.detectChanges();
  await new Promise((resolve) => setTimeout(resolve, 0));
  http.expectOne(`/api/auth/invitations/${TOKEN}`).flush(preview);
  await fixture.whenStable();
  fixture.detectChanges();
  const host = fixture.nativeElement as HTMLElement;
  const type = async (selector: string, value: string) => {
    const input = host.querySelector<HTMLInputElement>(selector)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    await fixture.whenStable();
  };
  const submit = async () => {
    host.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    await fixture.whenStable();
  };
  return { http, host, type, submit };
}

const invitation = (hasAccount: boolean): InvitationPreview => ({
  firmName: 'Welcoming Plaster',
  email: 'ada@example.test',
  role: 'office',
  hasAccount,
});

describe('joining a team from an invitation', () => {
  it('asks a new person for a name and a new password', async () => {
    const { http, host, type, submit } = await render(invitation(false));
    expect(host.querySelector('[data-testid=invitation-existing]')).toBeNull();
    expect(host.querySelector('input[autocomplete=name]')).not.toBeNull();
    expect(host.querySelector('input[type=password]')!.getAttribute('autocomplete')).toBe('new-password');
    await type('input[autocomplete=name]', 'Ada Office');
    await type('input[type=password]', 'ledger-and-lime-77');
    await submit();
    const req = http.expectOne('/api/auth/invitations/accept');
    expect(req.request.body).toEqual({ token: TOKEN, name: 'Ada Office', password: 'ledger-and-lime-77' });
  });

  it('tells someone who already has an account, and asks only for its password', async () => {
    const { http, host, type, submit } = await render(invitation(true));
    expect(host.querySelector('[data-testid=invitation-existing]')?.textContent).toContain(
      'ada@example.test already has a Layerbook account. Enter its password to join Welcoming Plaster',
    );
    expect(host.querySelector('input[autocomplete=name]')).toBeNull();
    const password = host.querySelector('input[type=password]')!;
    expect(password.getAttribute('autocomplete')).toBe('current-password');
    expect(host.textContent).toContain('Your Layerbook password');
    await type('input[type=password]', 'my-old-password-1');
    await submit();
    const req = http.expectOne('/api/auth/invitations/accept');
    expect(req.request.body).toEqual({ token: TOKEN, password: 'my-old-password-1' });
  });
});
