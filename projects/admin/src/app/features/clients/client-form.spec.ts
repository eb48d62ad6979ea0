import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { beforeEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import clients from '../../../i18n/clients/en.json';
import { ClientForm } from './client-form';

describe('ClientForm language', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        provideNoopAnimations(),
        provideTestI18n({ clients, common }),
      ],
    });
  });

  /** The component's protected form, for the test to fill. */
  const formOf = (component: ClientForm) => (component as unknown as { form: ClientForm['form'] }).form;

  async function render() {
    const fixture = TestBed.createComponent(ClientForm);
    await fixture.whenStable();
    return { fixture, host: fixture.nativeElement as HTMLElement };
  }

  it('offers the client a language, the firm’s by default', async () => {
    const { fixture, host } = await render();
    expect(host.textContent).toContain('Language');
    expect(host.textContent).toContain('For their portal, e-mails and PDFs.');
    expect(formOf(fixture.componentInstance).controls.language.value).toBeNull();
  });

  it.each([
    [null, null],
    ['es', 'es'],
  ] as const)('sends language %s as %s with a new client', async (chosen, sent) => {
    const { fixture, host } = await render();
    formOf(fixture.componentInstance).patchValue({ name: 'Ida Marsh', language: chosen });
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    const request = TestBed.inject(HttpTestingController).expectOne('/api/clients');
    expect(request.request.body).toMatchObject({ name: 'Ida Marsh', language: sent });
  });

  it('says what a field needs in the words of the area and the shared field errors', async () => {
    const { fixture, host } = await render();
    formOf(fixture.componentInstance).patchValue({ name: '', email: 'not-an-address' });
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    await fixture.whenStable();
    expect(host.textContent).toContain('Enter the client name.');
    expect(host.textContent).toContain('Enter a valid e-mail address, like name@example.com.');
  });
});
