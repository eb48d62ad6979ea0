import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { SampleBoardListItem } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import samples from '../../../i18n/samples/en.json';
import { Session } from '../../core/auth/session';
import { staffSession } from '../../shared/testing/staff-session';
import { SampleList } from './sample-list';

const board = (n: number): SampleBoardListItem => ({
  id: `b${n}`,
  label: `Board ${n}`,
  clientId: 'c1',
  clientName: 'Wren Halloway',
  siteId: null,
  round: 1,
  status: 'draft',
  finishName: null,
  photoCount: 0,
  coverThumbnailUrl: null,
  decidedAt: null,
  createdAt: '2026-01-05T09:00:00.000Z',
});

function render() {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ samples }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  TestBed.inject(Session).accept(staffSession('office'));
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(SampleList);
  fixture.detectChanges();
  return { fixture, http, host: fixture.nativeElement as HTMLElement };
}

const rows = (host: HTMLElement) => [...host.querySelectorAll('tbody th[scope="row"]')].map((r) => r.textContent?.trim());
const moreButton = (host: HTMLElement) =>
  [...host.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.trim() === 'Show more sample boards');

describe('SampleList', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('reads the boards a page at a time, adding the next page below the first', async () => {
    const { fixture, http, host } = render();
    http.expectOne('/api/samples?limit=50').flush({ items: [board(3), board(2)], nextCursor: 'c2' });
    await fixture.whenStable();
    expect(rows(host)).toEqual(['Board 3', 'Board 2']);

    moreButton(host)?.click();
    http.expectOne('/api/samples?limit=50&after=c2').flush({ items: [board(1)], nextCursor: null });
    await fixture.whenStable();
    expect(rows(host)).toEqual(['Board 3', 'Board 2', 'Board 1']);
    expect(moreButton(host)).toBeUndefined();
  });
});
