import { ChangeDetectionStrategy, Component, RESPONSE_INIT, inject } from '@angular/core';
import { RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';

@Component({
  selector: 'lb-not-found',
  imports: [RouterLink, TranslatePipe],
  template: `
    <main class="lb-page">
      <h1>{{ 'common.notFound.title' | translate }}</h1>
      <p class="lb-lead">{{ 'common.notFound.lead' | translate }}</p>
      <p>
        <a routerLink="/">{{ 'common.notFound.home' | translate }}</a>
      </p>
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
