import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { TranslatePipe } from '@ngx-translate/core';
import type { ItemList, ProductHazardsInput, ProductView } from '@layerbook/contracts/types';
import { Language } from '../../../../../shared/i18n/language';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { LIBRARY_URLS, LibraryApi, archivedParam } from './library-api';
import { hazardWords } from './library-words';
import { ProductForm } from './product-form';

/** Products the firm buys, with container prices (hidden from crew by the server) and hazards in words. */
@Component({
  selector: 'lb-product-list',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatIconModule, MatProgressBarModule, MoneyPipe, ProductForm, TranslatePipe],
  templateUrl: './product-list.html',
  styleUrl: './library-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductList {
  private readonly api = inject(LibraryApi);
  private readonly session = inject(Session);
  private readonly firmCurrency = inject(FirmCurrency);
  private readonly language = inject(Language);

  protected readonly canEdit = computed(() => this.session.hasRole('office'));
  protected readonly currency = this.firmCurrency.code;
  protected readonly isHydrated = hydratedSignal();
  protected readonly showArchived = signal(false);
  private readonly list = httpResource<ItemList<ProductView>>(
    () => ({ url: LIBRARY_URLS.products, params: archivedParam(this.showArchived()) }),
    {
      defaultValue: { items: [] },
    },
  );
  protected readonly products = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly isBusy = signal(false);
  private readonly actionMessage = signal<string | null>(null);
  private readonly loadFailure = loadMessage(this.list);
  protected readonly message = computed(() => this.actionMessage() ?? this.loadFailure());
  /** 'new', a product id being edited, or null */
  protected readonly editing = signal<string | null>(null);
  protected readonly editingProduct = computed(() => this.products().find((p) => p.id === this.editing()) ?? null);
  protected readonly hazardWords = (hazards: ProductHazardsInput) => hazardWords(hazards, this.language.locale());

  constructor() {
    void this.firmCurrency.load();
  }

  protected toggleArchived(show: boolean): void {
    this.actionMessage.set(null);
    this.showArchived.set(show);
  }

  protected productSaved(saved: ProductView): void {
    this.editing.set(null);
    this.replaceInList(saved);
  }

  protected async setArchived(product: ProductView, isArchived: boolean): Promise<void> {
    this.isBusy.set(true);
    this.actionMessage.set(null);
    try {
      const saved = await this.api.setProductArchived(product.id, isArchived);
      if (isArchived && !this.showArchived()) {
        this.editList((items) => items.filter((p) => p.id !== saved.id));
      } else {
        this.replaceInList(saved);
      }
    } catch (error) {
      const problem = toProblem(error);
      this.actionMessage.set(problem.detail ?? problem.title);
    } finally {
      this.isBusy.set(false);
    }
  }

  /** The saved product in its place by name, without asking for the whole list again. */
  private replaceInList(saved: ProductView): void {
    this.editList((items) => [...items.filter((p) => p.id !== saved.id), saved].sort((a, b) => a.name.localeCompare(b.name)));
  }

  /** Changes the shown list in place; a list that failed to load is asked for again instead. */
  private editList(change: (items: readonly ProductView[]) => readonly ProductView[]): void {
    if (this.list.hasValue()) this.list.update((list) => ({ items: change(list.items) }));
    else this.list.reload();
  }
}
