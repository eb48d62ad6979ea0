import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** Layerbook's mark: three trowelled strata over a base coat, then the name in the serif. */
@Component({
  selector: 'lb-wordmark',
  host: {
    role: 'img',
    'aria-label': 'Layerbook',
    '[class.on-dark]': 'tone() === "dark"',
  },
  template: `
    <svg viewBox="0 0 32 32" width="32" height="32" aria-hidden="true" focusable="false">
      <path d="M4 11.5c4-2.2 8-2.2 12 0s8 2.2 12 0v4c-4 2.2-8 2.2-12 0s-8-2.2-12 0z" fill="#3f8f7f" />
      <path d="M4 17.5c4-2.2 8-2.2 12 0s8 2.2 12 0v4c-4 2.2-8 2.2-12 0s-8-2.2-12 0z" fill="#c8962e" />
      <path d="M4 23.5c4-2.2 8-2.2 12 0s8 2.2 12 0V28H4z" class="base" />
      <path d="M4 6.5c4-2.2 8-2.2 12 0s8 2.2 12 0" fill="none" class="line" stroke-width="1.6" />
    </svg>
    <span aria-hidden="true" translate="no">Layerbook</span>
  `,
  styles: `
    :host {
      display: inline-flex;
      align-items: center;
      gap: 0.5rem;
      font-family: var(--lb-serif);
      font-weight: 600;
      font-size: 1.5rem;
      letter-spacing: -0.01em;
      color: var(--lb-umber-dark);
    }
    .base {
      fill: var(--lb-umber);
    }
    .line {
      stroke: var(--lb-umber);
    }
    :host(.on-dark) {
      color: var(--lb-ivory);
      font-size: 1.25rem;
    }
    :host(.on-dark) .base {
      fill: var(--lb-ivory-deep);
    }
    :host(.on-dark) .line {
      stroke: var(--lb-ivory);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Wordmark {
  readonly tone = input<'light' | 'dark'>('light');
}
