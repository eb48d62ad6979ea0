import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { ClientBoardView, ItemList } from '@layerbook/contracts/types';
import { TranslatePipe } from '@ngx-translate/core';
import { BOARDS_URL } from './board-api';

/**
 * The sample boards waiting for the client's answer, for the portal's home: boards come before a
 * proposal in the trade's flow, so a client with no proposal yet still sees what is there for them.
 * Nothing is shown while loading, on a failure (the boards page says it) or with none waiting.
 */
@Component({
  selector: 'lb-waiting-boards',
  imports: [MatIconModule, RouterLink, TranslatePipe],
  template: `
    @if (waiting().length) {
      <section class="lb-notice waiting" aria-labelledby="waiting-boards-heading">
        <mat-icon aria-hidden="true">palette</mat-icon>
        <div>
          <h2 id="waiting-boards-heading">
            {{ (waiting().length === 1 ? 'samples.waiting.titleOne' : 'samples.waiting.title') | translate: { count: waiting().length } }}
          </h2>
          <p>{{ 'samples.waiting.lead' | translate: { firm: waiting()[0].firmName } }}</p>
          <ul>
            @for (b of waiting(); track b.id) {
              <li>
                <a [routerLink]="['/boards', b.id]">{{ b.label }}</a>
                @if (b.finishName) {
                  <span> · {{ b.finishName }}</span>
                }
              </li>
            }
          </ul>
        </div>
      </section>
    }
  `,
  styles: `
    .waiting {
      margin-bottom: 1.5rem;
    }
    h2 {
      margin: 0 0 0.25rem;
      font-size: 1.1rem;
    }
    p,
    ul {
      margin: 0.25rem 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaitingBoards {
  private readonly boards = httpResource<ItemList<ClientBoardView>>(() => BOARDS_URL);

  protected readonly waiting = computed(() =>
    this.boards.hasValue() ? this.boards.value().items.filter((b) => b.status === 'shown') : [],
  );
}
