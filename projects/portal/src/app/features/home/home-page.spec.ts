import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { describe, expect, it } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import samples from '../../../i18n/samples/en.json';
import { HomePage } from './home-page';

describe('the portal home', () => {
  it('puts a board waiting for an answer under the page heading, and says no proposal has come yet', async () => {
    TestBed.configureTestingModule({
      providers: [provideTestI18n({ proposals, samples, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(HomePage);
    TestBed.inject(ApplicationRef).tick();
    const http = TestBed.inject(HttpTestingController);
    http.expectOne('/api/portal/proposals').flush({ items: [] });
    http.expectOne('/api/portal/boards').flush({
      items: [
        {
          id: 'b1',
          label: 'Turret room, two-coat limewash',
          round: 1,
          status: 'shown',
          firmName: 'Fernhollow',
          finishName: null,
          finishSteps: [],
          clientComment: '',
          decidedAt: null,
          timeZone: 'America/New_York',
          photos: [],
        },
      ],
    });
    await fixture.whenStable();
    fixture.detectChanges();
    const html = fixture.nativeElement as HTMLElement;
    const headings = Array.from(html.querySelectorAll('h1, h2')).map((h) => h.tagName);
    expect(headings.slice(0, 2)).toEqual(['H1', 'H2']);
    expect(html.textContent).toContain('Turret room, two-coat limewash');
    expect(html.textContent).toContain('No proposals yet.');
    expect(html.textContent).not.toContain('Nothing here yet');
  });
});
