import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { AUDIT_KINDS, type AuditEntry, type ItemList, type TeamMember } from '@layerbook/contracts/types';
import { TranslatePipe } from '@ngx-translate/core';
import { distinctUntilChanged, map } from 'rxjs';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { keysetList } from '../../shared/forms/keyset-list';
import { FormAlert } from '../../shared/ui/form-alert';
import {
  NO_ACTIVITY_FILTERS,
  activityFilterProblem,
  activityFiltersFromParams,
  activityFiltersToParams,
  activityListParams,
  recordRoute,
  sameActivityFilters,
  type ActivityFilters,
} from './activity-filters';

export const AUDIT_URL = '/api/audit';
export const FIRM_EXPORT_URL = '/api/firm/export';

/**
 * Activity: the owner reads the firm's audit log — who signed in, who changed prices, issued, voided
 * or refunded what — filtered by person, kind, days and record, newest first; and downloads all of
 * the firm's data. The filters live in the address bar, so a record's page can link here.
 */
@Component({
  selector: 'lb-activity',
  imports: [
    DatePipe,
    FormAlert,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './activity.html',
  styleUrl: './activity.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Activity {
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);

  protected readonly kinds = AUDIT_KINDS;
  protected readonly exportUrl = FIRM_EXPORT_URL;
  protected readonly isHydrated = hydratedSignal();
  protected readonly recordRoute = recordRoute;

  protected readonly filters = toSignal(
    this.route.queryParams.pipe(map(activityFiltersFromParams), distinctUntilChanged(sameActivityFilters)),
    {
      initialValue: NO_ACTIVITY_FILTERS,
    },
  );
  protected readonly problem = computed(() => activityFilterProblem(this.filters()));
  protected readonly isFiltered = computed(() => !sameActivityFilters(this.filters(), NO_ACTIVITY_FILTERS));
  protected readonly list = keysetList<AuditEntry>(AUDIT_URL, () => {
    const filters = this.filters();
    // A filter the server would refuse is shown beside its field; the list keeps to the valid ones.
    return activityListParams(activityFilterProblem(filters) === 'to' ? { ...filters, to: '' } : filters);
  });
  private readonly team = httpResource<ItemList<TeamMember>>(() => '/api/team/members');
  protected readonly people = computed(() => (this.team.hasValue() ? this.team.value().items : []));

  protected choose(field: keyof ActivityFilters, value: string): void {
    this.apply({ ...this.filters(), [field]: value });
  }

  protected clearFilters(): void {
    this.apply(NO_ACTIVITY_FILTERS);
  }

  protected whoOf(entry: AuditEntry): string {
    return entry.actor.name ?? entry.actor.email ?? '';
  }

  private apply(filters: ActivityFilters): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: activityFiltersToParams(filters), replaceUrl: true });
  }
}
