import { Resource, effect, untracked } from '@angular/core';

/**
 * Puts a loaded value into a form, and again whenever the resource holds a new one (a reload, or
 * the server's answer to a save set into it). Reactive forms are filled imperatively, so this is
 * the one effect an edit page needs. Call in an injection context.
 */
export function fillWhenLoaded<T>(resource: Resource<T | undefined>, fill: (value: T) => void): void {
  effect(() => {
    if (!resource.hasValue()) {
      return;
    }
    const value = resource.value();
    if (value !== undefined) {
      untracked(() => fill(value));
    }
  });
}
