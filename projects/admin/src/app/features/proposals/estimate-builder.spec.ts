import { TestBed } from '@angular/core/testing';
import { HttpErrorResponse } from '@angular/common/http';
import { provideRouter } from '@angular/router';
import type { EstimateContext, EstimateInputs, EstimateView } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import { EstimateApi } from './estimate-api';
import { EstimateBuilder } from './estimate-builder';

/*
 * The builder's saving, without its template: a save answered while the office kept typing keeps the
 * typing (and says "unsaved"), a save over someone else's names it and offers to reload, and unsaved
 * changes hold the page (the route guard and the browser's prompt ask).
 */

const context = {
  rooms: [
    {
      id: 'r1',
      name: 'Dining room',
      isExterior: false,
      surfaces: [{ id: 's1', name: 'Walls', shape: { kind: 'ceilingRect', length: 1, width: 1 }, disturbedPaintedArea: null }],
    },
  ],
  finishSystems: [{ id: 'f1', name: 'Limewash', layers: [] }],
} as unknown as EstimateContext;

const inputs: EstimateInputs = {
  title: 'Dining room',
  startDate: '2026-12-03',
  isOccupied: false,
  variants: [{ id: 'A', label: 'Option A', surfaces: [{ surfaceId: 's1', finishSystemId: 'f1' }] }],
  addOns: [],
  equipment: [],
  subcontracts: [],
  sundries: [],
  discount: null,
  perAreaRates: {},
  internalNotes: '',
  clientNotes: '',
};

const viewOf = (computedAt: string | null, over: Partial<EstimateInputs> = {}): EstimateView => ({
  id: 'e1',
  siteId: 'site-1',
  clientId: 'client-1',
  inquiryId: null,
  title: 'Dining room',
  status: 'draft',
  inputs: { ...inputs, ...over },
  result: null,
  price: null,
  computedAt,
  context,
});

/** The builder's protected members, as the template reads them. */
interface BuilderInside {
  form: { controls: Record<'title' | 'clientNotes', { setValue(v: string): void; value: string }> };
  isDirty(): boolean;
  justSaved(): boolean;
  isSavedByOther(): boolean;
  formMessage(): string | null;
  save(): Promise<void>;
  reload(): Promise<void>;
  warnBeforeUnload(event: Event): void;
}

async function openBuilder(api: Partial<Record<keyof EstimateApi, unknown>>) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n({ proposals }), provideRouter([]), { provide: EstimateApi, useValue: api }],
  });
  TestBed.overrideComponent(EstimateBuilder, { set: { template: '', imports: [], styleUrl: undefined, styles: [] } });
  await TestBed.compileComponents();
  const fixture = TestBed.createComponent(EstimateBuilder);
  fixture.componentRef.setInput('id', 'e1');
  fixture.detectChanges();
  await fixture.whenStable();
  return { builder: fixture.componentInstance, inside: fixture.componentInstance as unknown as BuilderInside };
}

describe('the estimate builder saving', () => {
  it('keeps what was typed while a save ran, and says the changes are not all saved', async () => {
    let answer: (view: EstimateView) => void = () => undefined;
    const saveInputs = vi.fn(() => new Promise<EstimateView>((resolve) => (answer = resolve)));
    const { builder, inside } = await openBuilder({ get: vi.fn(() => Promise.resolve(viewOf('2026-12-01T15:00:00.000Z'))), saveInputs });
    expect(builder.hasUnsavedChanges()).toBe(false);

    inside.form.controls.title.setValue('Dining room, walls');
    const saving = inside.save();
    inside.form.controls.clientNotes.setValue('We cover the floors daily.');
    answer(viewOf('2026-12-01T15:05:00.000Z', { title: 'Dining room, walls' }));
    await saving;

    expect(saveInputs).toHaveBeenCalledWith('e1', expect.objectContaining({ title: 'Dining room, walls' }), '2026-12-01T15:00:00.000Z');
    expect(inside.form.controls.clientNotes.value).toBe('We cover the floors daily.');
    expect(inside.form.controls.title.value).toBe('Dining room, walls');
    expect([inside.isDirty(), inside.justSaved(), builder.hasUnsavedChanges()]).toEqual([true, false, true]);

    // saved again, from the answer's save: nothing typed meanwhile, so all is saved
    saveInputs.mockImplementationOnce(() =>
      Promise.resolve(viewOf('2026-12-01T15:06:00.000Z', { title: 'Dining room, walls', clientNotes: 'We cover the floors daily.' })),
    );
    await inside.save();
    expect(saveInputs).toHaveBeenLastCalledWith('e1', expect.anything(), '2026-12-01T15:05:00.000Z');
    expect([inside.isDirty(), inside.justSaved()]).toEqual([false, true]);
  });

  it("offers to reload after someone else's save, and the reload shows theirs", async () => {
    const message = 'Someone else saved this estimate at 15:42, after you opened it. Reload to see their changes, then make yours again.';
    const refusal = new HttpErrorResponse({
      status: 409,
      error: { type: 'about:blank', title: 'Conflict', status: 409, detail: message, errors: [{ field: 'computedAt', message }] },
    });
    const get = vi.fn(() => Promise.resolve(viewOf('2026-12-01T15:00:00.000Z')));
    const { inside } = await openBuilder({ get, saveInputs: vi.fn(() => Promise.reject(refusal as Error)) });
    inside.form.controls.title.setValue('Mine');
    await inside.save();
    expect([inside.isSavedByOther(), inside.formMessage(), inside.isDirty()]).toEqual([true, message, true]);

    get.mockImplementationOnce(() => Promise.resolve(viewOf('2026-12-01T15:42:00.000Z', { title: 'Theirs' })));
    await inside.reload();
    expect([inside.isSavedByOther(), inside.formMessage(), inside.form.controls.title.value, inside.isDirty()]).toEqual([
      false,
      null,
      'Theirs',
      false,
    ]);
  });

  it('asks the browser to hold the page only while there are unsaved changes', async () => {
    const { inside } = await openBuilder({ get: vi.fn(() => Promise.resolve(viewOf(null))) });
    const unload = () => {
      const event = new Event('beforeunload', { cancelable: true });
      inside.warnBeforeUnload(event);
      return event.defaultPrevented;
    };
    expect(unload()).toBe(false);
    inside.form.controls.title.setValue('Changed');
    expect(unload()).toBe(true);
  });
});
