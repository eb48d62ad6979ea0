import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe } from '@ngx-translate/core';
import type { FinishSystemSummary, ItemList } from '@layerbook/contracts/types';
import { Language } from '../../../../../shared/i18n/language';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { LIBRARY_URLS, LibraryApi, archivedParam } from './library-api';
import { waitWords } from './library-words';

@Component({
  selector: 'lb-system-list',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatIconModule, MatProgressBarModule, RouterLink, TranslatePipe],
  template: `
    <div class="bar">
      @if (canEdit()) {
        <a mat-flat-button routerLink="/library/systems/new">
          <mat-icon aria-hidden="true">add</mat-icon>
          {{ 'library.systemList.new' | translate }}
        </a>
      }
      <mat-checkbox [checked]="showArchived()" (change)="toggleArchived($event.checked)" [disabled]="!isHydrated()">{{
        'library.systemList.showArchived' | translate
      }}</mat-checkbox>
    </div>
    <lb-form-alert [message]="message()" />
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" [attr.aria-label]="'library.systemList.loading' | translate" />
    }
    <div class="table-wrap" tabindex="0" role="region" [attr.aria-label]="'library.systemList.table' | translate">
      <table [attr.aria-label]="'library.systemList.table' | translate">
        <thead>
          <tr>
            <th scope="col">{{ 'library.common.name' | translate }}</th>
            <th scope="col">{{ 'library.systemList.layers' | translate }}</th>
            <th scope="col">{{ 'library.systemList.totalWait' | translate }}</th>
            <th scope="col">{{ 'library.systemList.products' | translate }}</th>
            @if (canEdit()) {
              <th scope="col">
                <span class="lb-visually-hidden">{{ 'library.common.actions' | translate }}</span>
              </th>
            }
          </tr>
        </thead>
        <tbody>
          @for (system of systems(); track system.id) {
            <tr>
              <th scope="row">
                <a [routerLink]="['/library/systems', system.id]">{{ system.name }}</a>
                @if (system.archivedAt) {
                  <span class="tag"
                    ><mat-icon aria-hidden="true" inline>inventory_2</mat-icon> {{ 'library.common.archived' | translate }}</span
                  >
                }
              </th>
              <td>{{ system.layerCount }}</td>
              <td>{{ waitText(system.totalWaitHours).key | translate: waitText(system.totalWaitHours).params }}</td>
              <td>{{ productNames(system) }}</td>
              @if (canEdit()) {
                <td class="actions">
                  <button
                    mat-button
                    type="button"
                    (click)="duplicate(system)"
                    [disabled]="isBusy() || !isHydrated()"
                    [attr.aria-label]="'library.systemList.copyNamed' | translate: { name: system.name }"
                  >
                    {{ 'library.systemList.copy' | translate }}
                  </button>
                </td>
              }
            </tr>
          } @empty {
            @if (!isLoading()) {
              <tr>
                <td [attr.colspan]="canEdit() ? 5 : 4" class="none">
                  {{ 'library.systemList.empty' | translate }}
                  @if (canEdit()) {
                    {{ 'library.systemList.emptyHint' | translate }}
                  }
                </td>
              </tr>
            }
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './library-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SystemList {
  private readonly api = inject(LibraryApi);
  private readonly router = inject(Router);
  private readonly session = inject(Session);
  private readonly language = inject(Language);

  protected readonly canEdit = computed(() => this.session.hasRole('office') && !!this.session.user());
  protected readonly isHydrated = hydratedSignal();
  protected readonly showArchived = signal(false);
  private readonly list = httpResource<ItemList<FinishSystemSummary>>(
    () => ({ url: LIBRARY_URLS.systems, params: archivedParam(this.showArchived()) }),
    {
      defaultValue: { items: [] },
    },
  );
  protected readonly systems = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly isLoading = this.list.isLoading;
  protected readonly isBusy = signal(false);
  private readonly actionMessage = signal<string | null>(null);
  private readonly loadFailure = loadMessage(this.list);
  protected readonly message = computed(() => this.actionMessage() ?? this.loadFailure());
  protected readonly waitText = (hours: number) => waitWords(hours, this.language.locale());

  protected productNames(system: FinishSystemSummary): string {
    return system.usesProducts.map((p) => p.name).join(', ');
  }

  protected toggleArchived(show: boolean): void {
    this.actionMessage.set(null);
    this.showArchived.set(show);
  }

  protected async duplicate(system: FinishSystemSummary): Promise<void> {
    this.isBusy.set(true);
    this.actionMessage.set(null);
    try {
      const copy = await this.api.duplicateSystem(system.id);
      await this.router.navigate(['/library/systems', copy.id]);
    } catch (error) {
      const problem = toProblem(error);
      this.actionMessage.set(problem.detail ?? problem.title);
    } finally {
      this.isBusy.set(false);
    }
  }
}
