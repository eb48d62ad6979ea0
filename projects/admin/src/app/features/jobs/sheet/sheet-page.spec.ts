import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { JobProgressView, JobSheet } from '@layerbook/contracts/types';
import { provideRouter } from '@angular/router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { Language } from '../../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import cautionsEs from '../../../../../../shared/i18n/words/cautions/es.json';
import en from '../../../../i18n/sheet/en.json';
import es from '../../../../i18n/sheet/es.json';
import { sheet } from './sheet-fixtures';
import { todayIn } from './sheet-format';
import { type PendingMark, SHEET_MARKS, type SheetMarks } from './sheet-marks';
import { SheetPage } from './sheet-page';

/** Keys and figures a crew screen must never show (the server's money walk, seen from the page). */
const MONEY =
  /[$€£]|price|cost|amount|total|margin|tax|paid|balance|invoice|deposit|retainage|precio|costo|impuesto|factura|saldo|dep[oó]sito/i;

class FakeMarks implements SheetMarks {
  readonly waiting = signal<readonly PendingMark[]>([]);
  readonly online = signal(true);
  readonly answer = signal<JobProgressView | null>(null);
  /** like the offline service: a mark the server counts gives a new progress answer */
  readonly mark = vi.fn(() => {
    this.answer.set({ workItems: [], walkthroughOn: null, valueLines: [] });
    return Promise.resolve();
  });
  readonly dismiss = vi.fn();
  pending() {
    return this.waiting.asReadonly();
  }
  progress() {
    return this.answer.asReadonly();
  }
}

async function render(language: 'en' | 'es' = 'en', answer: JobSheet = sheet) {
  const marks = new FakeMarks();
  TestBed.configureTestingModule({
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      { provide: SHEET_MARKS, useValue: marks },
      provideTestI18n(language === 'es' ? { sheet: es, cautions: cautionsEs } : { sheet: en }, language),
    ],
  });
  await TestBed.inject(Language).use(language);
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(SheetPage);
  fixture.componentRef.setInput('id', 'job-1');
  fixture.detectChanges();
  http.expectOne('/api/jobs/job-1/sheet').flush(answer);
  await fixture.whenStable();
  const host = fixture.nativeElement as HTMLElement;
  const text = () => (host.textContent ?? '').replace(/\s+/g, ' ');
  const button = (label: string) => host.querySelector<HTMLButtonElement>(`button[aria-label="${label}"]`);
  return { fixture, host, http, marks, text, button };
}

describe('SheetPage', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('shows where and when, the surfaces in the firm units, the day plan and the cautions', async () => {
    const { host, text } = await render();
    expect(host.querySelector('h1')?.textContent).toBe('Dining room in lime plaster');
    expect(text()).toContain('14 Orchard Lane, Millbrook');
    expect(text()).toContain('Dec 7, 2026 to Dec 11, 2026');
    // 40 m² = 430.6 ft² (NIST SP 811 App. B.8: 1 ft² = 0.09290304 m²)
    const sizes = Array.from(host.querySelectorAll('.sizes div')).map((d) => [
      d.querySelector('dt')?.textContent?.trim(),
      d.querySelector('dd')?.textContent?.trim(),
    ]);
    expect(sizes).toEqual([
      ['Gross', '473.6 ft²'],
      ['Openings', '43.1 ft²'],
      ['Net', '430.6 ft²'],
    ]);
    expect(text()).toContain('Dining room – Walls: Lime base coat is drying: next coat not before Thu 09:00');
    expect(text()).toContain('Lime is caustic');
    expect(text()).toContain('Keep eyewash on site; flush eyes or skin with water for at least 15 minutes.');
    expect(text()).toContain('Guidance, not a regulation. Outside the US, check your national or provincial rules.');
    expect(text()).toContain("Follow local codes, the product's safety data sheet and licensed or qualified practice.");
    expect(text()).toContain('Flammable: flash point 40 °C (104 °F)');
    expect(text()).toContain('Flammable: Oil glazing medium (category 3, flash point 40 °C).');
  });

  it('shows the changes the client approved, without their price, and no such section when there are none', async () => {
    expect((await render()).text()).not.toContain('Changes the client approved');
    TestBed.resetTestingModule();
    const changes: JobSheet['changes'] = [
      {
        number: 1,
        title: 'Venetian niche',
        description: 'Polished lime in the landing niche.',
        approvedOn: '2026-12-01',
        finishName: 'Polished lime',
        surfaces: [{ room: 'Landing', surface: 'Niche', quantity: '12 ft²' }],
      },
    ];
    // the niche the change adds is work to mark like the sold surfaces, tagged with its change
    const sold = sheet.rooms[0].surfaces[0];
    const niche = { ...sold, id: 's-9', name: 'Niche', changeOrder: 1, layers: [{ ...sold.layers[1], workItemId: 'w-9', doneOn: null }] };
    const rooms = [...sheet.rooms, { id: 'r-9', name: 'Landing', surfaces: [niche] }];
    const { text, button, host } = await render('en', { ...sheet, changes, rooms });
    expect(host.querySelector('[aria-label="Landing · Niche"] .tag')?.textContent?.trim()).toBe('Added by change 1');
    expect(button('Mark done: Glaze coat, Landing · Niche')).not.toBeNull();
    expect(text()).toContain('Changes the client approved');
    expect(text()).toContain('Change 1: Venetian niche');
    expect(text()).toContain('Approved Dec 1, 2026');
    expect(text()).toContain('Polished lime on:');
    expect(text()).toContain('Landing · Niche: 12 ft²');
    expect(text()).not.toMatch(MONEY);
  });

  it('shows no money anywhere on the sheet', async () => {
    const { text } = await render();
    expect(text()).not.toMatch(MONEY);
  });

  it('marks a layer done today where the firm works, then reads the sheet again', async () => {
    const { fixture, http, marks, button } = await render();
    button('Mark done: Glaze coat, Dining room · Walls')!.click();
    expect(marks.mark).toHaveBeenCalledWith('job-1', 'w-2', 'layerDone', todayIn('America/Chicago', new Date()));
    // the page reads the sheet again once the mark is sent or kept
    await vi.waitFor(() => http.expectOne('/api/jobs/job-1/sheet').flush(sheet));
    await fixture.whenStable();
  });

  it('says a mark waits on the phone and shows the layer done meanwhile; a refused one says why', async () => {
    const { fixture, marks, text, button } = await render();
    marks.waiting.set([
      { clientKey: 'k1', workItemId: 'w-2', kind: 'layerDone', on: '2026-12-08', state: 'waiting' },
      { clientKey: 'k2', workItemId: 'w-1', kind: 'layerReopened', on: '2026-12-08', state: 'refused', problem: 'The day is too late.' },
    ]);
    await fixture.whenStable();
    expect(text()).toContain('Saved on this phone — will send when online');
    expect(text()).toContain('Done on Dec 8, 2026');
    expect(button('Reopen: Glaze coat, Dining room · Walls')).not.toBeNull();
    expect(text()).toContain('Not marked: The day is too late.');
  });

  it('reads the sheet again when a mark kept on the phone is counted later (back online)', async () => {
    const { fixture, http, marks } = await render();
    marks.answer.set({ workItems: [], walkthroughOn: null, valueLines: [] });
    fixture.detectChanges();
    await vi.waitFor(() => http.expectOne('/api/jobs/job-1/sheet').flush(sheet));
    await fixture.whenStable();
  });

  it('tells the crew when the phone is offline', async () => {
    const { fixture, marks, text } = await render();
    marks.online.set(false);
    await fixture.whenStable();
    expect(text()).toContain('No connection: this is the sheet as last opened.');
  });

  it('reads in Spanish, cautions by their keys and times in the reader language', async () => {
    const { text } = await render('es');
    expect(text()).toContain('Marcar terminada');
    expect(text()).toContain('la siguiente mano no antes de jue 09:00');
    expect(text()).toContain(cautionsEs['lime-alkali'].title);
    expect(text()).toContain(cautionsEs['lime-alkali'].eyewash);
    expect(text()).toContain(cautionsEs.standing);
    expect(text()).not.toContain('Lime is caustic');
    // a listed product has words of its own: its category and flash point said in Spanish
    expect(text()).toContain('Inflamables: Oil glazing medium (categoría 3, punto de inflamación 40 °C).');
    expect(text()).not.toMatch(MONEY);
  });
});
