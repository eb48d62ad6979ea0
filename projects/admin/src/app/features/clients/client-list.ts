import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import { CLIENT_KINDS, CLIENT_KIND_LABELS, SEARCH_MAX_LENGTH, type ClientKind, type ClientSummary } from '@layerbook/contracts/types';
import { debounceTime, distinctUntilChanged, map, tap } from 'rxjs';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { keysetList } from '../../shared/forms/keyset-list';
import { FormAlert } from '../../shared/ui/form-alert';
import {
  NO_CLIENT_FILTERS,
  clientFiltersFromParams,
  clientFiltersToParams,
  clientListParams,
  sameClientFilters,
  type ClientFilters,
} from './client-filters';

const SEARCH_PAUSE_MS = 300;

@Component({
  selector: 'lb-client-list',
  imports: [
    DatePipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './client-list.html',
  styleUrl: './client-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientList {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);

  protected readonly kinds = CLIENT_KINDS;
  protected readonly kindLabels = CLIENT_KIND_LABELS;
  protected readonly searchMaxLength = SEARCH_MAX_LENGTH;
  protected readonly isHydrated = hydratedSignal();
  protected readonly search = new FormControl('', { nonNullable: true });
  protected readonly kind = new FormControl<ClientKind | null>(null);

  /** The address bar holds the filters; the list follows it, cancelling any older search. */
  private readonly filters = toSignal(
    this.route.queryParams.pipe(
      map(clientFiltersFromParams),
      distinctUntilChanged(sameClientFilters),
      tap((filters) => this.showFilters(filters)),
    ),
    { initialValue: NO_CLIENT_FILTERS },
  );
  protected readonly list = keysetList<ClientSummary>('/api/clients', () => clientListParams(this.filters()));
  protected readonly isFiltered = computed(() => !!(this.filters().q || this.filters().kind));

  constructor() {
    const destroyRef = inject(DestroyRef);
    this.search.valueChanges
      .pipe(debounceTime(SEARCH_PAUSE_MS), distinctUntilChanged(), takeUntilDestroyed(destroyRef))
      .subscribe((q) => this.applyFilters({ ...this.filters(), q }));
    this.kind.valueChanges.pipe(takeUntilDestroyed(destroyRef)).subscribe((kind) => this.applyFilters({ ...this.filters(), kind }));
  }

  private applyFilters(filters: ClientFilters): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: clientFiltersToParams(filters), replaceUrl: true });
  }

  private showFilters(filters: ClientFilters): void {
    this.kind.setValue(filters.kind, { emitEvent: false });
    if (this.search.value.trim() !== filters.q.trim()) {
      this.search.setValue(filters.q, { emitEvent: false });
    }
  }
}
