import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatTabsModule } from '@angular/material/tabs';
import { ActivatedRoute, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { map } from 'rxjs';
import { ProductList } from './product-list';
import { SystemList } from './system-list';

/** The library: finish systems (the layer stacks) and the products they use, one tab each, each with its own address. */
@Component({
  selector: 'lb-library-page',
  imports: [MatTabsModule, ProductList, RouterLink, SystemList, TranslatePipe],
  template: `
    <section class="lb-page">
      <h1>{{ 'library.page.title' | translate }}</h1>
      <p class="lb-lead">{{ 'library.page.lead' | translate }}</p>
      <nav mat-tab-nav-bar [tabPanel]="panel" [attr.aria-label]="'library.page.title' | translate">
        <a mat-tab-link routerLink="/library" [active]="tab() === 'systems'">{{ 'library.page.systems' | translate }}</a>
        <a mat-tab-link routerLink="/library/products" [active]="tab() === 'products'">{{ 'library.page.products' | translate }}</a>
      </nav>
      <mat-tab-nav-panel #panel class="panel">
        @if (tab() === 'products') {
          <lb-product-list />
        } @else {
          <lb-system-list />
        }
      </mat-tab-nav-panel>
    </section>
  `,
  styles: `
    .panel {
      display: block;
      padding-top: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LibraryPage {
  private readonly data = toSignal(inject(ActivatedRoute).data.pipe(map((d) => d['tab'] as unknown)));
  protected readonly tab = computed(() => (this.data() === 'products' ? 'products' : 'systems'));
}
