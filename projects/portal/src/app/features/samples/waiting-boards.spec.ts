import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ClientBoardView } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import samples from '../../../i18n/samples/en.json';
import { wordsAt } from '../../testing/words';
import { WaitingBoards } from './waiting-boards';

const board = (id: string, status: ClientBoardView['status']): ClientBoardView => ({
  id,
  label: `Stair hall, board ${id}`,
  round: 1,
  status,
  firmName: 'Ochre Lane Finishes',
  finishName: 'Antiqued glaze over primer',
  finishSteps: [],
  clientComment: '',
  decidedAt: null,
  timeZone: 'America/New_York',
  photos: [],
});

async function render(items: ClientBoardView[]) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ samples }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  const fixture = TestBed.createComponent(WaitingBoards);
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController).expectOne('/api/portal/boards').flush({ items });
  await fixture.whenStable();
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

describe('the sample boards waiting on the home page', () => {
  it('lists each board waiting for an answer, with a link to it, and says what is there', async () => {
    const html = await render([board('A', 'shown'), board('B', 'approved')]);
    expect(html.querySelector('h2')?.textContent?.trim()).toBe(samples.waiting.titleOne);
    expect(html.textContent).toContain(wordsAt({ samples }, 'samples.waiting.lead', { firm: 'Ochre Lane Finishes' }));
    const links = [...html.querySelectorAll('a')].map((a) => [a.textContent, a.getAttribute('href')]);
    expect(links).toEqual([['Stair hall, board A', '/boards/A']]);
  });

  it('counts several', async () => {
    const html = await render([board('A', 'shown'), board('C', 'shown')]);
    expect(html.querySelector('h2')?.textContent?.trim()).toBe(wordsAt({ samples }, 'samples.waiting.title', { count: 2 }));
  });

  it('shows nothing when no board is waiting', async () => {
    const html = await render([board('B', 'approved')]);
    expect(html.textContent?.trim()).toBe('');
  });
});
