import { TestBed } from '@angular/core/testing';
import { TranslateLoader, TranslateService, getValue, provideTranslateService, type TranslationObject } from '@ngx-translate/core';
import { Observable, of } from 'rxjs';
import { type UsedGroups, pickGroups, watchWordReads } from './used-words';

const words: TranslationObject = {
  today: { title: 'Today', money: { owed: 'Owed to you', paid: 'Paid' } },
  billing: { invoiceList: { title: 'Invoices' }, voidDialog: { title: 'Void' } },
  layout: { nav: { today: 'Today' } },
  brand: 'Layerbook',
};

describe('watchWordReads / pickGroups', () => {
  it('notes the group each key read goes through, and picks only those groups', () => {
    const used: UsedGroups = new Set();
    const watched = watchWordReads(words, used);
    expect(getValue(watched, 'today.money.owed')).toBe('Owed to you');
    expect(getValue(watched, 'brand')).toBe('Layerbook');
    expect(getValue(watched, 'billing.nothing.here')).toBeUndefined();
    expect([...used].sort()).toEqual(['brand', 'today.money']);
    expect(pickGroups(words, used)).toEqual({ brand: 'Layerbook', today: { money: { owed: 'Owed to you', paid: 'Paid' } } });
  });

  it('picks nothing when nothing was read', () => {
    expect(pickGroups(words, new Set())).toEqual({});
  });

  it('notes the reads ngx-translate makes for the translate pipe', () => {
    const used: UsedGroups = new Set();
    class Watched implements TranslateLoader {
      getTranslation(): Observable<TranslationObject> {
        return of(watchWordReads(words, used));
      }
    }
    TestBed.configureTestingModule({
      providers: [provideTranslateService({ fallbackLang: 'en', lang: 'en', loader: { provide: TranslateLoader, useClass: Watched } })],
    });
    const translate = TestBed.inject(TranslateService);
    expect(translate.instant('layout.nav.today')).toBe('Today');
    expect(translate.instant('billing.voidDialog.title')).toBe('Void');
    expect([...used].sort()).toEqual(['billing.voidDialog', 'layout.nav']);
  });
});
