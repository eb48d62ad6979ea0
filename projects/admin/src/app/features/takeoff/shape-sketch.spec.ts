import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import takeoff from '../../../i18n/takeoff/en.json';
import { ShapeSketch } from './shape-sketch';

describe('ShapeSketch', () => {
  it('says one opening in the singular, in the drawing and in its label for screen readers', async () => {
    TestBed.configureTestingModule({ providers: [provideZonelessChangeDetection(), provideTestI18n({ takeoff })] });
    const fixture = TestBed.createComponent(ShapeSketch);
    fixture.componentRef.setInput('shape', { kind: 'walls', perimeter: 40, height: 8, openings: [{ width: 3, height: 7 }] });
    fixture.componentRef.setInput('unit', 'ft');
    await fixture.whenStable();
    const svg = (fixture.nativeElement as HTMLElement).querySelector('svg');
    expect(svg?.getAttribute('aria-label')).toBe('Walls laid out flat: perimeter 40 ft, height 8 ft, 1 opening.');
    expect([...(svg?.querySelectorAll('text') ?? [])].map((t) => t.textContent)).toContain('1 opening');
  });
});
