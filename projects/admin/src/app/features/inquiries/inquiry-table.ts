import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import type { InquirySource, InquiryStage, InquirySummary } from '@layerbook/contracts';
import { catchError, debounceTime, distinctUntilChanged, firstValueFrom, map, of, switchMap, tap } from 'rxjs';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FollowUpDate } from '../../shared/ui/follow-up-date';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { INQUIRY_SOURCES, INQUIRY_STAGES, SOURCE_LABELS, STAGE_ICONS, STAGE_LABELS } from '../../shared/ui/stage-words';
import { Assignees } from './assignees';
import { InquiryApi } from './inquiry-api';
import { INQUIRY_SORTS, type InquiryFilters, type InquirySort, filtersFromParams, filtersToParams } from './inquiry-filters';
import { InquiryViews } from './inquiry-views';

const SEARCH_PAUSE_MS = 300;

@Component({
  selector: 'lb-inquiry-table',
  imports: [
    DatePipe,
    FollowUpDate,
    FormAlert,
    InquiryViews,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatTableModule,
    MoneyPipe,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './inquiry-table.html',
  styleUrl: './inquiry-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryTable {
  private readonly api = inject(InquiryApi);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly firmCurrency = inject(FirmCurrency);
  private readonly assignees = inject(Assignees);

  protected readonly columns = ['contact', 'stage', 'source', 'value', 'followUp', 'assignee', 'received'];
  protected readonly stages = INQUIRY_STAGES;
  protected readonly sources = INQUIRY_SOURCES;
  protected readonly sorts = INQUIRY_SORTS;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly stageIcons = STAGE_ICONS;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly people = this.assignees.active;
  protected readonly currency = this.firmCurrency.code;
  protected readonly isHydrated = hydratedSignal();

  protected readonly items = signal<readonly InquirySummary[]>([]);
  protected readonly nextCursor = signal<string | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly isLoadingMore = signal(false);
  protected readonly message = signal<string | null>(null);

  protected readonly search = new FormControl('', { nonNullable: true });
  protected readonly filters = inject(NonNullableFormBuilder).group({
    stage: new FormControl<InquiryStage | null>(null),
    source: new FormControl<InquirySource | null>(null),
    assignee: new FormControl<string | null>(null),
    sort: new FormControl<InquirySort>('newest', { nonNullable: true }),
  });
  private current: InquiryFilters = filtersFromParams({});

  /** Table cell templates receive rows untyped; this gives them their type back. */
  protected readonly typed = (row: InquirySummary): InquirySummary => row;

  constructor() {
    void this.firmCurrency.load();
    void this.assignees.load();
    const destroyRef = inject(DestroyRef);

    // The address bar is the one source of truth: controls write to it, and the list follows it.
    this.route.queryParams
      .pipe(
        map(filtersFromParams),
        distinctUntilChanged((a, b) => JSON.stringify(a) === JSON.stringify(b)),
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

    this.filters.valueChanges.pipe(takeUntilDestroyed(destroyRef)).subscribe(() => {
      const { stage, source, assignee, sort } = this.filters.getRawValue();
      this.applyFilters({ ...this.current, stage, source, assignee, sort });
    });
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

  protected clearFilters(): void {
    this.applyFilters(filtersFromParams({}));
  }

  protected hasFilters(): boolean {
    const { stage, source, assignee, q } = this.current;
    return !!(stage || source || assignee || q);
  }

  private applyFilters(filters: InquiryFilters): void {
    void this.router.navigate([], {
      relativeTo: this.route,
      queryParams: filtersToParams(filters),
      replaceUrl: true,
    });
  }

  /** Puts the address bar's filters in the controls without starting another round trip. */
  private showFilters(filters: InquiryFilters): void {
    this.current = filters;
    this.isLoading.set(true);
    const { stage, source, assignee, sort, q } = filters;
    this.filters.setValue({ stage, source, assignee, sort }, { emitEvent: false });
    if (this.search.value.trim() !== q.trim()) {
      this.search.setValue(q, { emitEvent: false });
    }
  }
}
