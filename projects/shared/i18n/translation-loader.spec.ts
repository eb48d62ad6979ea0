import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TransferState, makeStateKey } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { TranslateService, type TranslationObject } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import { provideI18n } from './i18n-providers';
import { TransferTranslationLoader } from './translation-loader';

describe('TransferTranslationLoader in the browser', () => {
  // The page's state is read as the app starts (provideI18n's initializer chooses the language).
  const start = (carried: TranslationObject | null) =>
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        ...provideI18n(),
        {
          provide: TransferState,
          useFactory: () => {
            const state = new TransferState();
            if (carried) state.set(makeStateKey<TranslationObject>('lb-i18n-en'), carried);
            return state;
          },
        },
      ],
    });

  it('starts from the words the page carried, then takes the whole file in their place', async () => {
    start({ today: { title: 'Today' } });
    const translate = TestBed.inject(TranslateService);
    await firstValueFrom(translate.use('en'));
    expect(translate.instant('today.title')).toBe('Today');
    // Not carried, asked for before the rest came in: blank (not the key) while the whole file loads.
    expect(translate.instant('billing.voidDialog.title')).toBe('');
    const http = TestBed.inject(HttpTestingController);
    http.expectOne('/i18n/en.json').flush({ today: { title: 'Today' }, billing: { voidDialog: { title: 'Void the invoice' } } });
    expect(translate.instant('billing.voidDialog.title')).toBe('Void the invoice');
    // All words in: a missing word shows its key again, and nothing more is fetched.
    expect(translate.instant('no.such.word')).toBe('no.such.word');
    http.verify();
  });

  it('loads the whole file when the page carried no words', async () => {
    start(null);
    const translate = TestBed.inject(TranslateService);
    const using = firstValueFrom(translate.use('en'));
    TestBed.inject(HttpTestingController)
      .expectOne('/i18n/en.json')
      .flush({ today: { title: 'Today' } });
    await using;
    expect(translate.instant('today.title')).toBe('Today');
    expect(TestBed.inject(TransferTranslationLoader).incomplete).toBe(false);
  });
});
