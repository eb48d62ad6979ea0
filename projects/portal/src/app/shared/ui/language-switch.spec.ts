import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { describe, expect, it, vi } from 'vitest';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import layout from '../../../i18n/layout/en.json';
import { LanguageSwitch } from './language-switch';

@Component({ imports: [LanguageSwitch], template: '<lb-language-switch />' })
class Page {}

describe('the language switch on signed-out pages', () => {
  it('links to this page in the other language (working before the script loads), and switches the words at once', async () => {
    TestBed.configureTestingModule({
      providers: [provideTestI18n({ common, layout }), provideRouter([{ path: 'sign-in', component: Page }])],
    });
    const router = TestBed.inject(Router);
    await router.navigateByUrl('/sign-in?next=%2Fportal%2Finvoices%2Fi-1');
    const fixture = TestBed.createComponent(Page);
    fixture.detectChanges();
    const html = fixture.nativeElement as HTMLElement;
    expect(html.querySelector('[aria-current]')?.textContent?.trim()).toBe('English');
    const other = html.querySelector<HTMLAnchorElement>('a')!;
    expect([other.textContent?.trim(), other.getAttribute('lang')]).toEqual(['Español', 'es']);
    expect(other.getAttribute('href')).toBe('/sign-in?next=%2Fportal%2Finvoices%2Fi-1&lang=es');
    other.click();
    await vi.waitFor(() => expect(TestBed.inject(Language).current()).toBe('es'));
    await vi.waitFor(() => expect(router.url).toBe('/sign-in?next=%2Fportal%2Finvoices%2Fi-1&lang=es'));
  });
});
