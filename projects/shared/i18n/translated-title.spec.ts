import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Title } from '@angular/platform-browser';
import { Router, provideRouter } from '@angular/router';
import { TranslateService } from '@ngx-translate/core';
import { provideTestI18n } from './testing';
import { provideTranslatedTitles } from './translated-title';

@Component({ template: '' })
class Blank {}

describe('TranslatedTitle', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideTestI18n({ layout: { titles: { today: 'Today · Layerbook' } } }),
        provideRouter([
          { path: 'today', title: 'layout.titles.today', component: Blank },
          { path: 'plain', title: 'Plain words', component: Blank },
        ]),
        provideTranslatedTitles(),
      ],
    });
  });

  it('shows the words for a title key', async () => {
    await TestBed.inject(Router).navigateByUrl('/today');
    expect(TestBed.inject(Title).getTitle()).toBe('Today · Layerbook');
  });

  it('shows a title that is not a key as written', async () => {
    await TestBed.inject(Router).navigateByUrl('/plain');
    expect(TestBed.inject(Title).getTitle()).toBe('Plain words');
  });

  it('follows a change of language', async () => {
    await TestBed.inject(Router).navigateByUrl('/today');
    const translate = TestBed.inject(TranslateService);
    translate.setTranslation('es', { layout: { titles: { today: 'Hoy · Layerbook' } } });
    translate.use('es');
    expect(TestBed.inject(Title).getTitle()).toBe('Hoy · Layerbook');
  });
});
