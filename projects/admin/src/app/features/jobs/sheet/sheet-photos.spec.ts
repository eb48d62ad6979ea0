import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { JobPhotoView, JobSheet } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../../shared/i18n/testing';
import common from '../../../../../../shared/i18n/words/common/en.json';
import en from '../../../../i18n/sheet/en.json';
import { sheet } from './sheet-fixtures';
import { SheetPhotos } from './sheet-photos';

async function render(given: JobSheet = sheet) {
  TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting(), provideTestI18n({ sheet: en, common })] });
  const fixture = TestBed.createComponent(SheetPhotos);
  fixture.componentRef.setInput('sheet', given);
  await fixture.whenStable();
  return { fixture, host: fixture.nativeElement as HTMLElement, http: TestBed.inject(HttpTestingController) };
}

describe('SheetPhotos', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('offers each layer on each surface as what the photos show', async () => {
    const { host } = await render();
    const options = Array.from(host.querySelectorAll('option')).map((o) => [o.value, o.textContent?.trim()]);
    expect(options).toEqual([
      ['', 'The whole job'],
      ['w-1', 'Dining room · Walls · Lime base coat'],
      ['w-2', 'Dining room · Walls · Glaze coat'],
    ]);
    expect(host.textContent).toContain('Progress photos');
    expect(host.textContent).toContain('No progress photos yet.');
  });

  it('names a change order’s redo of a surface in what the photos show', async () => {
    const [room] = sheet.rooms;
    const redo = { ...room.surfaces[0], changeOrder: 2, layers: [{ ...room.surfaces[0].layers[0], workItemId: 'w-9', doneOn: null }] };
    const { host } = await render({ ...sheet, rooms: [{ ...room, surfaces: [...room.surfaces, redo] }] });
    const options = Array.from(host.querySelectorAll('option')).map((o) => o.textContent?.replace(/\s+/g, ' ').trim());
    expect(options.at(-1)).toBe('Dining room · Walls · Lime base coat · Added by change 2');
  });

  it('offers delete only on the photos the server says the reader may delete', async () => {
    const photo = (id: string, caption: string, canDelete: boolean): JobPhotoView => ({
      id,
      fileId: `f-${id}`,
      caption,
      width: 64,
      height: 48,
      thumbnailUrl: `/api/files/f-${id}/thumbnail`,
      downloadUrl: `/api/files/f-${id}`,
      originalName: 'wall.jpg',
      createdAt: '2026-12-08T10:00:00.000Z',
      workItemId: null,
      canDelete,
    });
    const { host } = await render({ ...sheet, photos: [photo('p-1', 'Mine', true), photo('p-2', 'Rosa’s', false)] });
    const items = Array.from(host.querySelectorAll('li.photo'));
    expect(items.map((li) => li.querySelector('button.delete') !== null)).toEqual([true, false]);
  });

  it('sends the caption and the layer with each photo added', async () => {
    const { fixture, host, http } = await render();
    const caption = host.querySelector('input[matInput]') as HTMLInputElement;
    caption.value = '  Base coat drying, north wall  ';
    caption.dispatchEvent(new Event('input'));
    const select = host.querySelector('select') as HTMLSelectElement;
    select.value = 'w-1';
    select.dispatchEvent(new Event('change'));
    fixture.detectChanges();
    const picker = host.querySelector('input[type="file"]') as HTMLInputElement;
    const photo = new File([new Uint8Array([0xff, 0xd8, 0xff])], 'wall.jpg', { type: 'image/jpeg' });
    Object.defineProperty(picker, 'files', { value: [photo], configurable: true });
    picker.dispatchEvent(new Event('change'));
    const request = http.expectOne('/api/jobs/job-1/photos');
    const body = request.request.body as FormData;
    expect(request.request.method).toBe('POST');
    expect(body.get('caption')).toBe('Base coat drying, north wall');
    expect(body.get('workItemId')).toBe('w-1');
    expect((body.get('file') as File).name).toBe('wall.jpg');
    request.flush(null);
  });
});
