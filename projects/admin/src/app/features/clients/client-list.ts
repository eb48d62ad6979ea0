import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, Params, Router, RouterLink } from '@angular/router';
import type { ClientKind, ClientSummary } from '@layerbook/contracts';
import { catchError, debounceTime, distinctUntilChanged, firstValueFrom, map, of, switchMap, tap } from 'rxjs';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { ClientApi, type ClientFilters } from './client-api';
import { CLIENT_KINDS, CLIENT_KIND_LABELS, isClientKind } from './client-words';

const SEARCH_PAUSE_MS = 300;

function filtersFromParams(params: Params): ClientFilters {
  const q: unknown = params['q'];
  const kind: unknown = params['kind'];
  return { q: typeof q === 'string' ? q.slice(0, 100) : '', kind: isClientKind(kind) ? kind : null };
}

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
  ],
  templateUrl: './client-list.html',
  styleUrl: './client-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientList {
  private readonly api = inject(ClientApi);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);

  protected readonly kinds = CLIENT_KINDS;
  protected readonly kindLabels = CLIENT_KIND_LABELS;
  protected readonly isHydrated = hydratedSignal();
  protected readonly items = signal<readonly ClientSummary[]>([]);
  protected readonly nextCursor = signal<string | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly isLoadingMore = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly search = new FormControl('', { nonNullable: true });
  protected readonly kind = new FormControl<ClientKind | null>(null);
  private current: ClientFilters = { q: '', kind: null };

  constructor() {
    const destroyRef = inject(DestroyRef);
    // The address bar holds the filters; the list follows it, cancelling any older search.
    this.route.queryParams
      .pipe(
        map(filtersFromParams),
        distinctUntilChanged((a, b) => a.q === b.q && a.kind === b.kind),
        tap((filters) => this.showFilters(filters)),
        switchMap((filters) =>
          this.api.list(filters).pipe(
            map((page) => ({ page, error: null })),
            catchError((error: unknown) => of({ page: null, error })),
          ),
        ),
        takeUntilDestroyed(destroyRef),
      )
      .subscribe(({ page, error }) => {
        this.isLoading.set(false);
        this.items.set(page?.items ?? []);
        this.nextCursor.set(page?.nextCursor ?? null);
        this.message.set(error ? toProblem(error).title : null);
      });

    this.search.valueChanges
      .pipe(debounceTime(SEARCH_PAUSE_MS), distinctUntilChanged(), takeUntilDestroyed(destroyRef))
      .subscribe((q) => this.applyFilters({ ...this.current, q }));
    this.kind.valueChanges
      .pipe(takeUntilDestroyed(destroyRef))
      .subscribe((kind) => this.applyFilters({ ...this.current, kind }));
  }

  protected async loadMore(): Promise<void> {
    const after = this.nextCursor();
    if (!after) {
      return;
    }
    this.isLoadingMore.set(true);
    try {
      const page = await firstValueFrom(this.api.list(this.current, after));
      this.items.update((items) => [...items, ...page.items]);
      this.nextCursor.set(page.nextCursor);
    } catch (error) {
      this.message.set(toProblem(error).title);
    } finally {
      this.isLoadingMore.set(false);
    }
  }

  protected hasFilters(): boolean {
    return !!(this.current.q || this.current.kind);
  }

  private applyFilters(filters: ClientFilters): void {
    void this.router.navigate([], {
      relativeTo: this.route,
      queryParams: { q: filters.q.trim() || null, kind: filters.kind },
      replaceUrl: true,
    });
  }

  private showFilters(filters: ClientFilters): void {
    this.current = filters;
    this.isLoading.set(true);
    this.kind.setValue(filters.kind, { emitEvent: false });
    if (this.search.value.trim() !== filters.q.trim()) {
      this.search.setValue(filters.q, { emitEvent: false });
    }
  }
}
