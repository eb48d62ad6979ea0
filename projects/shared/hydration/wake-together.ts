import { ChangeDetectorRef, Directive, inject } from '@angular/core';

/**
 * For a `@defer (hydrate …)` block on screen at first paint: put it on the block's first element.
 * Waking writes each element's static classes over the rendered ones (Angular sets them up as for a
 * new element), and the bindings that put the rest back (Material's field classes) wait for the next
 * change detection — left to itself that can come a task later, after a frame is painted, and the
 * fields show unstyled for a moment: the page shifts. Asking for change detection while the block is
 * created gets it run before the next paint. It makes waking one longer task, so keep such blocks small.
 */
@Directive({ selector: '[lbWakeTogether]' })
export class WakeTogether {
  constructor() {
    inject(ChangeDetectorRef).markForCheck();
  }
}
