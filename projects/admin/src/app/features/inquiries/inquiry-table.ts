import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import {
  INQUIRY_SORTS,
  INQUIRY_SORT_LABELS,
  INQUIRY_SOURCES,
  INQUIRY_STAGES,
  SEARCH_MAX_LENGTH,
  SOURCE_LABELS,
  STAGE_LABELS,
  UNASSIGNED,
  type InquirySort,
  type InquirySource,
  type InquiryStage,
  type InquirySummary,
} from '@layerbook/contracts/types';
import { debounceTime, distinctUntilChanged, map, tap } from 'rxjs';
import { FirmCurrency } from '../../core/firm/firm-currency';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { keysetList } from '../../shared/forms/keyset-list';
import { FollowUpDate } from '../../shared/ui/follow-up-date';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { Assignees } from './assignees';
import {
  NO_FILTERS,
  filtersFromParams,
  filtersToParams,
  hasFilters,
  listParams,
  sameFilters,
  type InquiryFilters,
} from './inquiry-filters';
import { InquiryViews } from './inquiry-views';
import { STAGE_ICONS } from './stage-icons';

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
    TranslatePipe,
  ],
  templateUrl: './inquiry-table.html',
  styleUrl: './inquiry-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryTable {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly firmCurrency = inject(FirmCurrency);

  protected readonly columns = ['contact', 'stage', 'source', 'value', 'followUp', 'assignee', 'received'];
  protected readonly stages = INQUIRY_STAGES;
  protected readonly sources = INQUIRY_SOURCES;
  protected readonly sorts = INQUIRY_SORTS;
  protected readonly sortLabels = INQUIRY_SORT_LABELS;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly stageIcons = STAGE_ICONS;
  protected readonly sourceLabels = SOURCE_LABELS;
  protected readonly unassigned = UNASSIGNED;
  protected readonly searchMaxLength = SEARCH_MAX_LENGTH;
  protected readonly people = inject(Assignees).active;
  protected readonly currency = this.firmCurrency.code;
  protected readonly isHydrated = hydratedSignal();

  protected readonly search = new FormControl('', { nonNullable: true });
  protected readonly filterForm = inject(NonNullableFormBuilder).group({
    stage: new FormControl<InquiryStage | null>(null),
    source: new FormControl<InquirySource | null>(null),
    assignee: new FormControl<string | null>(null),
    sort: new FormControl<InquirySort>('newest', { nonNullable: true }),
  });

  /** The address bar is the one source of truth: controls write to it, and the list follows it. */
  private readonly filters = toSignal(
    this.route.queryParams.pipe(
      map(filtersFromParams),
      distinctUntilChanged(sameFilters),
      tap((filters) => this.showFilters(filters)),
    ),
    { initialValue: NO_FILTERS },
  );
  protected readonly list = keysetList<InquirySummary>('/api/inquiries', () => listParams(this.filters()));
  protected readonly isFiltered = computed(() => hasFilters(this.filters()));

  /** Table cell templates receive rows untyped; this gives them their type back. */
  protected readonly typed = (row: InquirySummary): InquirySummary => row;

  constructor() {
    void this.firmCurrency.load();
    const destroyRef = inject(DestroyRef);
    this.search.valueChanges
      .pipe(debounceTime(SEARCH_PAUSE_MS), distinctUntilChanged(), takeUntilDestroyed(destroyRef))
      .subscribe((q) => this.applyFilters({ ...this.filters(), q }));
    this.filterForm.valueChanges.pipe(takeUntilDestroyed(destroyRef)).subscribe(() => {
      const { stage, source, assignee, sort } = this.filterForm.getRawValue();
      this.applyFilters({ ...this.filters(), stage, source, assignee, sort });
    });
  }

  protected clearFilters(): void {
    this.applyFilters(NO_FILTERS);
  }

  private applyFilters(filters: InquiryFilters): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: filtersToParams(filters), replaceUrl: true });
  }

  /** Puts the address bar's filters in the controls without starting another round trip. */
  private showFilters({ stage, source, assignee, sort, q }: InquiryFilters): void {
    this.filterForm.setValue({ stage, source, assignee, sort }, { emitEvent: false });
    if (this.search.value.trim() !== q.trim()) {
      this.search.setValue(q, { emitEvent: false });
    }
  }
}
