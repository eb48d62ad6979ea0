import { ElementRef, Injector, afterNextRender, inject } from '@angular/core';

/**
 * For a component whose action swaps its own controls for a result: focus would fall to the page
 * body with the removed button, so it is moved to the result (a `tabindex="-1"` heading or status
 * found by `selector` in the component) once the new view is on screen. Call in an injection context.
 */
export function focusAfterRender(): (selector: string) => void {
  const injector = inject(Injector);
  const host = inject<ElementRef<HTMLElement>>(ElementRef);
  return (selector) => afterNextRender(() => host.nativeElement.querySelector<HTMLElement>(selector)?.focus(), { injector });
}
