import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ProductView } from '@layerbook/contracts';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { LibraryApi } from './library-api';
import { UNIT_SHORT, hazardWords, kindLabel } from './library-words';
import { ProductForm } from './product-form';

/** Products the firm buys, with container prices (hidden from crew by the server) and hazards in words. */
@Component({
  selector: 'lb-product-list',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatIconModule, MatProgressBarModule, MoneyPipe, ProductForm],
  templateUrl: './product-list.html',
  styleUrl: './library-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductList {
  private readonly api = inject(LibraryApi);
  private readonly session = inject(Session);
  private readonly firmCurrency = inject(FirmCurrency);

  protected readonly canEdit = computed(() => this.session.hasRole('office'));
  protected readonly currency = this.firmCurrency.code;
  protected readonly isHydrated = hydratedSignal();
  protected readonly products = signal<readonly ProductView[]>([]);
  protected readonly showArchived = signal(false);
  protected readonly isLoading = signal(true);
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  /** 'new', a product id being edited, or null */
  protected readonly editing = signal<string | null>(null);
  protected readonly editingProduct = computed(() => this.products().find((p) => p.id === this.editing()) ?? null);
  protected readonly hazardWords = hazardWords;
  protected readonly kindLabel = kindLabel;
  protected readonly unitShort = UNIT_SHORT;

  constructor() {
    void this.firmCurrency.load();
    void this.load();
  }

  protected toggleArchived(show: boolean): void {
    this.showArchived.set(show);
    void this.load();
  }

  protected productSaved(saved: ProductView): void {
    this.editing.set(null);
    this.products.update((list) => {
      const others = list.filter((p) => p.id !== saved.id);
      return [...others, saved].sort((a, b) => a.name.localeCompare(b.name));
    });
  }

  protected async setArchived(product: ProductView, isArchived: boolean): Promise<void> {
    this.isBusy.set(true);
    this.message.set(null);
    try {
      const saved = await this.api.setProductArchived(product.id, isArchived);
      if (isArchived && !this.showArchived()) {
        this.products.update((list) => list.filter((p) => p.id !== saved.id));
      } else {
        this.productSaved(saved);
      }
    } catch (error) {
      const problem = toProblem(error);
      this.message.set(problem.detail ?? problem.title);
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(): Promise<void> {
    this.isLoading.set(true);
    try {
      this.products.set(await this.api.products(this.showArchived() ? 'include' : 'exclude'));
      this.message.set(null);
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
