import { Signal, afterNextRender, signal } from '@angular/core';

/**
 * False on the server and until the browser has hydrated this component. Forms wrap their fields
 * in `<fieldset [disabled]="!isHydrated()">`: hydration re-writes each control's value, so
 * anything typed into the server-rendered page before then would be silently lost.
 * (Automated tests wait for enabled fields the same way.)
 */
export function hydratedSignal(): Signal<boolean> {
  const isHydrated = signal(false);
  afterNextRender(() => isHydrated.set(true));
  return isHydrated.asReadonly();
}
