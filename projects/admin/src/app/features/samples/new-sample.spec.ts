import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ClientDetail, ClientSummary, SiteView } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import samples from '../../../i18n/samples/en.json';
import { NewSample } from './new-sample';

const WREN: ClientSummary = {
  id: 'c1',
  kind: 'homeowner',
  isCompany: false,
  name: 'Wren Halloway',
  email: 'wren@example.com',
  phone: '',
  createdAt: '2026-01-05T09:00:00.000Z',
};
const SITE: SiteView = {
  id: 's1',
  clientId: 'c1',
  label: '',
  addressLine1: '14 Kiln Row',
  addressLine2: '',
  city: 'Ashford Vale',
  region: '',
  postalCode: '',
  country: 'US',
  accessNotes: '',
  yearBuilt: null,
  isPre1978: null,
};
const WREN_DETAIL: ClientDetail = { ...WREN, notes: '', language: null, contacts: [], sites: [SITE], inquiries: [] };

async function render() {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ samples }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(NewSample);
  fixture.detectChanges();
  http.expectOne('/api/library/systems').flush({ items: [] });
  await fixture.whenStable();
  return { fixture, http, host: fixture.nativeElement as HTMLElement };
}

async function settle(fixture: ComponentFixture<NewSample>) {
  fixture.detectChanges();
  await fixture.whenStable();
  fixture.detectChanges();
}

async function typeClient(fixture: ComponentFixture<NewSample>, text: string) {
  const box = (fixture.nativeElement as HTMLElement).querySelector<HTMLInputElement>('input[type="search"]');
  if (!box) throw new Error('no client box');
  box.focus();
  box.dispatchEvent(new Event('focusin'));
  box.value = text;
  box.dispatchEvent(new Event('input'));
  await settle(fixture);
}

/** Types a name, waits out the search's pause, answers it with Wren and picks her from the list. */
async function chooseWren(fixture: ComponentFixture<NewSample>, http: HttpTestingController) {
  await typeClient(fixture, 'Wren');
  await new Promise((resolve) => setTimeout(resolve, 300));
  http.expectOne((r) => r.url === '/api/clients' && r.params.get('q') === 'Wren').flush({ items: [WREN], nextCursor: null });
  await settle(fixture);
  const option = document.querySelector<HTMLElement>('mat-option');
  if (!option) throw new Error('Wren is not offered');
  option.click();
  // Not settled first: the page stays busy until the client's details answer.
  TestBed.tick();
  http.expectOne('/api/clients/c1').flush(WREN_DETAIL);
  await settle(fixture);
}

async function siteChoices(fixture: ComponentFixture<NewSample>): Promise<string[]> {
  const host = fixture.nativeElement as HTMLElement;
  host.querySelector<HTMLElement>('mat-select[formcontrolname="siteId"] .mat-mdc-select-trigger')?.click();
  await settle(fixture);
  const words = [...document.querySelectorAll('.mat-mdc-select-panel mat-option')].map((o) => o.textContent?.trim() ?? '');
  document.dispatchEvent(new KeyboardEvent('keydown', { key: 'Escape' }));
  document.querySelector<HTMLElement>('.cdk-overlay-backdrop')?.click();
  await settle(fixture);
  return words;
}

function submit(fixture: ComponentFixture<NewSample>, label: string) {
  const host = fixture.nativeElement as HTMLElement;
  const box = host.querySelector<HTMLInputElement>('input[formcontrolname="label"]');
  if (!box) throw new Error('no label box');
  box.value = label;
  box.dispatchEvent(new Event('input'));
  host.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
}

// Rendering Material fields and overlays takes seconds in jsdom on a busy machine.
describe('NewSample: choosing the client', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('makes the board for the client picked from the list, offering their sites', async () => {
    const { fixture, http } = await render();
    await chooseWren(fixture, http);
    expect(await siteChoices(fixture)).toEqual(['No particular site', '14 Kiln Row, Ashford Vale']);
    submit(fixture, 'Hall board');
    const made = http.expectOne({ method: 'POST', url: '/api/samples' });
    expect(made.request.body).toEqual({ clientId: 'c1', label: 'Hall board', notes: '' });
  });

  it('forgets the chosen client once the box says something else: no board for them, and no longer their sites', async () => {
    const { fixture, http, host } = await render();
    await chooseWren(fixture, http);
    await typeClient(fixture, 'Someone else');
    expect(await siteChoices(fixture)).toEqual(['No particular site']);
    submit(fixture, 'Hall board');
    await settle(fixture);
    http.expectNone({ method: 'POST', url: '/api/samples' });
    expect(host.textContent).toContain('Choose the client from the list.');
    // Cleared, too: the board goes to nobody by mistake.
    await typeClient(fixture, '');
    host.querySelector<HTMLButtonElement>('button[type="submit"]')?.click();
    await settle(fixture);
    http.expectNone({ method: 'POST', url: '/api/samples' });
    // The search for "Someone else" may still be waiting out its pause: answer it if it went.
    await new Promise((resolve) => setTimeout(resolve, 300));
    for (const r of http.match((r) => r.url === '/api/clients')) r.flush({ items: [], nextCursor: null });
  });
});
