import { ChangeDetectionStrategy, Component, RESPONSE_INIT, inject } from '@angular/core';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'lb-not-found',
  imports: [RouterLink],
  template: `
    <main class="lb-page">
      <h1>There is no page here</h1>
      <p class="lb-lead">The address may be mistyped, or the page has moved.</p>
      <p><a routerLink="/">Go to the start page</a></p>
    </main>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFound {
  constructor() {
    // Tell crawlers and the host's logs the truth during server rendering.
    const response = inject(RESPONSE_INIT, { optional: true });
    if (response) {
      response.status = 404;
    }
  }
}
