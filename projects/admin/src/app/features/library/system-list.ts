import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type { FinishSystemSummary, ItemList } from '@layerbook/contracts/types';
import { waitText } from '@layerbook/domain';
import { Session } from '../../core/auth/session';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { loadMessage } from '../../shared/forms/load-message';
import { FormAlert } from '../../shared/ui/form-alert';
import { LIBRARY_URLS, LibraryApi, archivedParam } from './library-api';

@Component({
  selector: 'lb-system-list',
  imports: [FormAlert, MatButtonModule, MatCheckboxModule, MatIconModule, MatProgressBarModule, RouterLink],
  template: `
    <div class="bar">
      @if (canEdit()) {
        <a mat-flat-button routerLink="/library/systems/new">
          <mat-icon aria-hidden="true">add</mat-icon>
          New finish system
        </a>
      }
      <mat-checkbox [checked]="showArchived()" (change)="toggleArchived($event.checked)" [disabled]="!isHydrated()"
        >Show archived systems</mat-checkbox
      >
    </div>
    <lb-form-alert [message]="message()" />
    @if (isLoading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Loading finish systems" />
    }
    <div class="table-wrap" tabindex="0" role="region" aria-label="Finish systems">
      <table aria-label="Finish systems">
        <thead>
          <tr>
            <th scope="col">Name</th>
            <th scope="col">Layers</th>
            <th scope="col">Total wait</th>
            <th scope="col">Products</th>
            @if (canEdit()) {
              <th scope="col"><span class="lb-visually-hidden">Actions</span></th>
            }
          </tr>
        </thead>
        <tbody>
          @for (system of systems(); track system.id) {
            <tr>
              <th scope="row">
                <a [routerLink]="['/library/systems', system.id]">{{ system.name }}</a>
                @if (system.archivedAt) {
                  <span class="tag"><mat-icon aria-hidden="true" inline>inventory_2</mat-icon> Archived</span>
                }
              </th>
              <td>{{ system.layerCount }}</td>
              <td>{{ waitText(system.totalWaitHours) }}</td>
              <td>{{ productNames(system) }}</td>
              @if (canEdit()) {
                <td class="actions">
                  <button
                    mat-button
                    type="button"
                    (click)="duplicate(system)"
                    [disabled]="isBusy() || !isHydrated()"
                    [attr.aria-label]="'Copy ' + system.name"
                  >
                    Copy
                  </button>
                </td>
              }
            </tr>
          } @empty {
            @if (!isLoading()) {
              <tr>
                <td [attr.colspan]="canEdit() ? 5 : 4" class="none">
                  No finish systems yet.{{ canEdit() ? ' Add the products first, then build the layers.' : '' }}
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
  protected readonly waitText = waitText;

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
