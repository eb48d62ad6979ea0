import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import clients from '../../../i18n/clients/en.json';
import { Session } from '../../core/auth/session';
import { SiteForm } from './site-form';

async function render(country: string | null) {
  TestBed.configureTestingModule({
    providers: [
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      provideTestI18n({ clients, common }),
      { provide: Session, useValue: { user: () => (country ? { country } : null) } },
    ],
  });
  const fixture = TestBed.createComponent(SiteForm);
  fixture.componentRef.setInput('clientId', 'client-1');
  await fixture.whenStable();
  return { fixture, host: fixture.nativeElement as HTMLElement };
}

/** The component's protected form, for the test to fill. */
const formOf = (component: SiteForm) => (component as unknown as { form: SiteForm['form'] }).form;

describe('SiteForm country', () => {
  it('starts a new site in the firm’s country and sends it', async () => {
    const { fixture, host } = await render('CA');
    const form = formOf(fixture.componentInstance);
    expect(form.controls.country.value).toBe('CA');
    form.patchValue({ addressLine1: '12 Rideau Terrace' });
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    const request = TestBed.inject(HttpTestingController).expectOne('/api/clients/client-1/sites');
    expect(request.request.body).toMatchObject({ addressLine1: '12 Rideau Terrace', country: 'CA' });
  });

  it('starts in the default country when the session is not known', async () => {
    const { fixture } = await render(null);
    expect(formOf(fixture.componentInstance).controls.country.value).toBe('US');
  });
});
