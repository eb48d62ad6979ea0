import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import takeoff from '../../../i18n/takeoff/en.json';
import { SurfaceForm } from './surface-form';

describe('SurfaceForm', () => {
  // Its length rules once read the required `unit` input while the form was being built, before
  // Angular had set it: the form threw and "Add a surface" showed nothing.
  it.each(['ft', 'm'] as const)('opens empty for a new surface in %s, with its shape choice', async (unit) => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), provideTestI18n({ takeoff })],
    });
    const fixture = TestBed.createComponent(SurfaceForm);
    fixture.componentRef.setInput('roomId', '00000000-0000-4000-8000-000000000001');
    fixture.componentRef.setInput('roomName', 'Turret study');
    fixture.componentRef.setInput('unit', unit);
    await fixture.whenStable();
    const host = fixture.nativeElement as HTMLElement;
    expect(host.querySelector('mat-select')).not.toBeNull();
    expect(host.textContent).toContain('Shape');
  });
});
