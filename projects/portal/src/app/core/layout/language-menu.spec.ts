import { TestBed } from '@angular/core/testing';
import type { PortalClient } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import layout from '../../../i18n/layout/en.json';
import { LanguageMenu, languageChoices } from './language-menu';

type MenuClient = Pick<PortalClient, 'firmName' | 'language' | 'ownLanguage' | 'firmLanguage'>;
const following: MenuClient = { firmName: 'Quillfeather', language: 'es', ownLanguage: null, firmLanguage: 'es' };
const names = { en: 'English', es: 'Español' } as const;

describe('languageChoices', () => {
  it('marks the firm’s language, named with the firm, while the client follows it (null)', () => {
    const choices = languageChoices(following, (code) => names[code]);
    expect(choices.map((c) => [c.value, c.isChosen])).toEqual([
      ['en', false],
      ['es', false],
      [null, true],
    ]);
    expect(choices[2]).toMatchObject({ label: 'layout.shell.followFirm', params: { firm: 'Quillfeather', language: 'Español' } });
  });

  it('marks the client’s own choice even when it is the firm’s language too', () => {
    const choices = languageChoices({ ...following, ownLanguage: 'es' }, (code) => names[code]);
    expect(choices.filter((c) => c.isChosen).map((c) => c.value)).toEqual(['es']);
  });
});

async function render(client: MenuClient) {
  TestBed.configureTestingModule({ providers: [provideTestI18n({ layout, common })] });
  const fixture = TestBed.createComponent(LanguageMenu);
  fixture.componentRef.setInput('client', client);
  const chosen: (string | null)[] = [];
  fixture.componentInstance.choose.subscribe((value) => chosen.push(value));
  await fixture.whenStable();
  fixture.detectChanges();
  const trigger = (fixture.nativeElement as HTMLElement).querySelector('button')!;
  trigger.click();
  fixture.detectChanges();
  await fixture.whenStable();
  const items = Array.from(document.querySelectorAll<HTMLElement>('[role="menuitemradio"]'));
  return { fixture, trigger, items, chosen };
}

describe('the portal’s language menu', () => {
  it('names the language shown on its button and offers three choices, the firm’s marked', async () => {
    const { trigger, items } = await render(following);
    expect(trigger.textContent).toContain('Español');
    // The words beside the check mark (the mark is an icon ligature, hidden from screen readers).
    expect(items.map((i) => i.querySelector('mat-icon + span')?.textContent?.trim())).toEqual([
      'English',
      'Español',
      'Same as Quillfeather (Español)',
    ]);
    expect(items.map((i) => i.getAttribute('aria-checked'))).toEqual(['false', 'false', 'true']);
  });

  it('sends null when the client goes back to the firm’s language', async () => {
    const { items, chosen } = await render({ ...following, language: 'en', ownLanguage: 'en' });
    expect(items.map((i) => i.getAttribute('aria-checked'))).toEqual(['true', 'false', 'false']);
    items[2].click();
    expect(chosen).toEqual([null]);
  });
});
