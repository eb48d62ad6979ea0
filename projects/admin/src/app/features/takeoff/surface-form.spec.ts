import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { SurfaceView, TakeoffLengthUnit } from '@layerbook/contracts/types';
import { measureSurface, type SurfaceShape } from '@layerbook/domain';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import takeoff from '../../../i18n/takeoff/en.json';
import { SurfaceForm } from './surface-form';

const ROOM_ID = '00000000-0000-4000-8000-000000000001';
const SURFACE_ID = '00000000-0000-4000-8000-0000000000a1';

/** A surface as the API answers it, saved in feet. */
function savedInFeet(name: string, shape: SurfaceShape, disturbedPaintedArea: number | null): SurfaceView {
  return {
    id: SURFACE_ID,
    roomId: ROOM_ID,
    name,
    position: 0,
    shape,
    lengthUnit: 'ft',
    disturbedPaintedArea,
    notes: '',
    measure: measureSurface(shape),
  };
}

/** The component's protected form, for the test to read and change. */
const formOf = (component: SurfaceForm) => (component as unknown as { form: SurfaceForm['form'] }).form;

async function open(unit: TakeoffLengthUnit, surface: SurfaceView | null) {
  TestBed.configureTestingModule({
    providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), provideTestI18n({ takeoff })],
  });
  const fixture = TestBed.createComponent(SurfaceForm);
  fixture.componentRef.setInput('roomId', ROOM_ID);
  fixture.componentRef.setInput('roomName', 'Turret study');
  fixture.componentRef.setInput('unit', unit);
  fixture.componentRef.setInput('surface', surface);
  await fixture.whenStable();
  const host = fixture.nativeElement as HTMLElement;
  const save = () => {
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    return TestBed.inject(HttpTestingController).expectOne(`/api/takeoff/surfaces/${SURFACE_ID}`).request;
  };
  return { fixture, host, form: formOf(fixture.componentInstance), save };
}

describe('SurfaceForm', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  // Its length rules once read the required `unit` input while the form was being built, before
  // Angular had set it: the form threw and "Add a surface" showed nothing.
  it.each(['ft', 'm'] as const)('opens empty for a new surface in %s, with its shape choice', async (unit) => {
    const { host } = await open(unit, null);
    expect(host.querySelector('mat-select')).not.toBeNull();
    expect(host.textContent).toContain('Shape');
  });

  it('shows a disturbed area saved in ft² in m² once the firm measures in metres, and saves it so', async () => {
    // 5 ft² × 0.09290304 = 0.4645 m² (1 ft = 0.3048 m exactly, NIST SP 811 App. B.8); it once showed 5 m², 10.76 times as much
    const { form, save } = await open('m', savedInFeet('Walls', { kind: 'walls', perimeter: 40, height: 8 }, 5));
    expect(form.controls.disturbedPaintedArea.value).toBe('0.46');
    const body = save().body as { shape: SurfaceShape; disturbedPaintedArea: number };
    expect(body).toMatchObject({ shape: { kind: 'walls', perimeter: 12.192, height: 2.4384 }, disturbedPaintedArea: 0.46 });
  });

  it('keeps a fully disturbed surface savable after the switch to metres (the area kept to hundredths)', async () => {
    // 10 × 5 ft = 50 ft², all sanded: 4.645152 m², shown and kept as 4.65 m², which is not "more than the surface"
    const { form, save } = await open('m', savedInFeet('Ceiling', { kind: 'ceilingRect', length: 10, width: 5 }, 50));
    expect(form.controls.disturbedPaintedArea.value).toBe('4.65');
    expect(form.controls.disturbedPaintedArea.errors).toBeNull();
    expect(save().body).toMatchObject({ shape: { kind: 'ceilingRect', length: 3.048, width: 1.524 }, disturbedPaintedArea: 4.65 });
  });

  it('keeps a saved name when the shape changes; a new surface takes the shape’s name', async () => {
    const { form } = await open('ft', savedInFeet('North wall', { kind: 'walls', perimeter: 40, height: 8 }, null));
    form.controls.shape.controls.kind.setValue('curvedWall');
    expect(form.controls.name.value).toBe('North wall');

    TestBed.resetTestingModule();
    const fresh = await open('ft', null);
    fresh.form.controls.shape.controls.kind.setValue('curvedWall');
    expect(fresh.form.controls.name.value).toBe('Curved wall');
  });
});
