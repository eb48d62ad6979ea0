import { ApplicationRef, Injector, resource, runInInjectionContext, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { fillWhenLoaded } from './fill-when-loaded';
import { loadMessage } from './load-message';

describe('fillWhenLoaded and loadMessage', () => {
  it('fill the form with each value the resource holds, and say nothing while all is well', async () => {
    const filled: string[] = [];
    const injector = TestBed.inject(Injector);
    const source = signal('first');
    const loaded = runInInjectionContext(injector, () =>
      resource({ params: () => source(), loader: ({ params }) => Promise.resolve(params) }),
    );
    runInInjectionContext(injector, () => fillWhenLoaded(loaded, (value) => filled.push(value)));
    const message = runInInjectionContext(injector, () => loadMessage(loaded));
    const app = TestBed.inject(ApplicationRef);
    await app.whenStable();
    app.tick();
    loaded.set('saved');
    app.tick();
    expect(filled).toEqual(['first', 'saved']);
    expect(message()).toBeNull();
  });

  it('say in words why a read failed', async () => {
    const injector = TestBed.inject(Injector);
    const failing = runInInjectionContext(injector, () =>
      resource({ loader: async (): Promise<string> => Promise.reject(new Error('down')) }),
    );
    const message = runInInjectionContext(injector, () => loadMessage(failing));
    await TestBed.inject(ApplicationRef).whenStable();
    expect(message()).toBe('Something went wrong. Please try again.');
  });
});
