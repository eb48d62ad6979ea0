import { ChangeDetectionStrategy, Component, afterNextRender, signal } from '@angular/core';
import { RouterOutlet } from '@angular/router';

/**
 * The root component of both apps: every page is a route. It marks itself `data-live` once the
 * browser has taken over the server-rendered page (after the first render in the browser), so
 * tests and tools can tell a live page from its server-rendered copy.
 */
@Component({
  selector: 'lb-root',
  imports: [RouterOutlet],
  template: '<router-outlet />',
  host: { '[attr.data-live]': 'isLive() ? "" : null' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly isLive = signal(false);

  constructor() {
    afterNextRender(() => this.isLive.set(true));
  }
}
