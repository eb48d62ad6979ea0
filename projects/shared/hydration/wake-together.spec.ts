import { ChangeDetectorRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it, vi } from 'vitest';
import { WakeTogether } from './wake-together';

describe('WakeTogether', () => {
  it('asks for change detection as the block it starts is created', () => {
    const markForCheck = vi.fn();
    TestBed.configureTestingModule({ providers: [{ provide: ChangeDetectorRef, useValue: { markForCheck } }] });
    TestBed.runInInjectionContext(() => new WakeTogether());
    expect(markForCheck).toHaveBeenCalledTimes(1);
  });
});
