import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { ClientMatch, ItemList } from '@layerbook/contracts/types';
import { problemMessage } from '../../core/errors/problem';
import { FormAlert } from '../../shared/ui/form-alert';
import { ClientApi, clientUrl } from './client-api';
import { matchLabel, matchWords } from './client-match-words';

/**
 * "Merge into…": clients that may be the same person as this one (same e-mail, phone or name).
 * Merging moves everything of this client to the chosen one and removes this record.
 */
@Component({
  selector: 'lb-client-merge',
  imports: [FormAlert, MatButtonModule, MatFormFieldModule, MatSelectModule, TranslatePipe],
  template: `
    @if (candidates().length > 0) {
      <section class="panel" aria-labelledby="merge-heading">
        <h2 id="merge-heading">{{ 'clients.clientMerge.heading' | translate }}</h2>
        <p class="muted">{{ 'clients.clientMerge.explain' | translate }}</p>
        <lb-form-alert [message]="message()" />
        <mat-form-field>
          <mat-label>{{ 'clients.clientMerge.clientToKeep' | translate }}</mat-label>
          <mat-select [value]="chosen()" (valueChange)="chosen.set($event)">
            @for (match of candidates(); track match.id) {
              <mat-option [value]="match.id">{{ label(match) }} — {{ words(match) }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <p>
          <button mat-stroked-button type="button" [disabled]="!chosen() || isBusy()" (click)="merge()">
            {{ 'clients.clientMerge.merge' | translate: { name: name() } }}
          </button>
        </p>
      </section>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientMerge {
  private readonly api = inject(ClientApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  readonly clientId = input.required<string>();
  readonly name = input.required<string>();

  protected readonly matches = httpResource<ItemList<ClientMatch>>(() => `${clientUrl(this.clientId())}/matches`);
  protected readonly candidates = computed(() => (this.matches.hasValue() ? this.matches.value().items : []));
  protected readonly chosen = signal<string | null>(null);
  protected readonly isBusy = signal(false);
  protected readonly message = signal<string | null>(null);
  protected readonly label = matchLabel;
  protected readonly words = matchWords;

  protected async merge(): Promise<void> {
    const into = this.candidates().find((m) => m.id === this.chosen());
    if (!into) {
      return;
    }
    this.isBusy.set(true);
    this.message.set(null);
    try {
      await this.api.merge(this.clientId(), { intoClientId: into.id });
      this.snackBar.open(
        String(this.translate.instant('clients.clientMerge.merged', { name: this.name(), into: into.name })),
        String(this.translate.instant('clients.close')),
        { duration: 5000 },
      );
      await this.router.navigate(['/clients', into.id]);
    } catch (error) {
      this.message.set(problemMessage(error));
    } finally {
      this.isBusy.set(false);
    }
  }
}
