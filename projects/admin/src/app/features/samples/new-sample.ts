import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import {
  SAMPLE_LABEL_MAX,
  SAMPLE_NOTES_MAX,
  type ClientDetail,
  type ClientSummary,
  type FinishSystemSummary,
  type ItemList,
  type SiteView,
} from '@layerbook/contracts/types';
import { siteLine } from '@layerbook/domain';
import { catchError, debounceTime, distinctUntilChanged, filter, map, of, switchMap } from 'rxjs';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { finishChoiceWords } from './finish-words';
import { FINISH_SYSTEMS_URL, SampleApi } from './sample-api';

/** A new board: whose it is (client, optional site), which finish it shows, a label and notes. */
@Component({
  selector: 'lb-new-sample',
  imports: [
    FormAlert,
    MatAutocompleteModule,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
    RouterLink,
    TranslatePipe,
  ],
  template: `
    <section class="lb-page">
      <p>
        <a routerLink="/samples">{{ 'samples.common.back' | translate }}</a>
      </p>
      <h1>{{ 'samples.newBoard.title' | translate }}</h1>
      <p class="lb-lead">{{ 'samples.newBoard.lead' | translate }}</p>

      <form [formGroup]="form" (ngSubmit)="save()" novalidate>
        <fieldset class="lb-gate" [disabled]="!isHydrated()">
          <mat-form-field>
            <mat-label>{{ 'samples.newBoard.client' | translate }}</mat-label>
            <input matInput type="search" [formControl]="clientSearch" [matAutocomplete]="clients" autocomplete="off" maxlength="100" />
            <mat-autocomplete #clients="matAutocomplete" (optionSelected)="chooseClient($event)">
              @for (c of clientOptions(); track c.id) {
                <mat-option [value]="c">{{ c.name }}</mat-option>
              }
            </mat-autocomplete>
            <mat-hint>{{ 'samples.newBoard.clientHint' | translate }}</mat-hint>
          </mat-form-field>
          @if (form.controls.clientId.invalid && form.controls.clientId.touched) {
            <p class="field-error" role="alert">{{ fieldError('clientId') | translate }}</p>
          }

          <mat-form-field>
            <mat-label>{{ 'samples.newBoard.site' | translate }}</mat-label>
            <mat-select formControlName="siteId">
              <mat-option [value]="''">{{ 'samples.newBoard.noSite' | translate }}</mat-option>
              @for (s of sites(); track s.id) {
                <mat-option [value]="s.id">{{ siteWords(s) }}</mat-option>
              }
            </mat-select>
            @if (form.controls.siteId.invalid) {
              <mat-error>{{ fieldError('siteId') | translate }}</mat-error>
            }
          </mat-form-field>

          <mat-form-field>
            <mat-label>{{ 'samples.newBoard.finish' | translate }}</mat-label>
            <mat-select formControlName="finishSystemId">
              <mat-option [value]="''">{{ 'samples.newBoard.notChosen' | translate }}</mat-option>
              @for (f of systems(); track f.id) {
                @let choice = finishChoice(f.name, f.layerCount);
                <mat-option [value]="f.id">{{ choice.key | translate: choice.params }}</mat-option>
              }
            </mat-select>
            @if (form.controls.finishSystemId.invalid) {
              <mat-error>{{ fieldError('finishSystemId') | translate }}</mat-error>
            }
          </mat-form-field>

          <mat-form-field>
            <mat-label>{{ 'samples.newBoard.label' | translate }}</mat-label>
            <input matInput formControlName="label" [maxlength]="labelMax" />
            <mat-hint>{{ 'samples.newBoard.labelHint' | translate }}</mat-hint>
            @if (form.controls.label.invalid) {
              <mat-error>{{ fieldError('label') | translate }}</mat-error>
            }
          </mat-form-field>

          <mat-form-field>
            <mat-label>{{ 'samples.newBoard.notes' | translate }}</mat-label>
            <textarea matInput formControlName="notes" rows="4" [maxlength]="notesMax"></textarea>
            <mat-hint>{{ 'samples.newBoard.notesHint' | translate }}</mat-hint>
            @if (form.controls.notes.invalid) {
              <mat-error>{{ fieldError('notes') | translate }}</mat-error>
            }
          </mat-form-field>

          <lb-form-alert [message]="message()" />
          <div class="actions">
            <button mat-flat-button type="submit" [disabled]="isSaving()">{{ 'samples.newBoard.make' | translate }}</button>
            <a mat-button routerLink="/samples">{{ 'samples.newBoard.cancel' | translate }}</a>
          </div>
        </fieldset>
      </form>
    </section>
  `,
  styles: `
    fieldset {
      display: grid;
      gap: 0.75rem;
      max-width: 36rem;
      border: 0;
      padding: 0;
      margin: 0;
    }
    .actions {
      display: flex;
      gap: 0.75rem;
    }
    .field-error {
      color: var(--mat-sys-error, #8c1d18);
      margin: -0.5rem 0 0;
      font-size: 0.875rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewSample {
  private readonly api = inject(SampleApi);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly destroyRef = inject(DestroyRef);
  private readonly translate = inject(TranslateService);

  protected readonly isHydrated = hydratedSignal();
  protected readonly siteWords = siteLine;
  protected readonly finishChoice = finishChoiceWords;
  protected readonly clientOptions = signal<readonly ClientSummary[]>([]);
  /** the client chosen from the search, whose sites the form offers, with the name the box then showed */
  private readonly chosen = signal<Pick<ClientSummary, 'id' | 'name'> | null>(null);
  private readonly chosenClient = httpResource<ClientDetail>(() => {
    const id = this.chosen()?.id;
    return id ? `/api/clients/${encodeURIComponent(id)}` : undefined;
  });
  private readonly systemList = httpResource<ItemList<FinishSystemSummary>>(() => FINISH_SYSTEMS_URL);
  // A failed look-up leaves the choice empty: the board can still be made without a site or finish.
  protected readonly sites = computed<readonly SiteView[]>(() => (this.chosenClient.hasValue() ? this.chosenClient.value().sites : []));
  protected readonly systems = computed<readonly FinishSystemSummary[]>(() =>
    this.systemList.hasValue() ? this.systemList.value().items : [],
  );
  protected readonly labelMax = SAMPLE_LABEL_MAX;
  protected readonly notesMax = SAMPLE_NOTES_MAX;
  protected readonly message = signal<string | null>(null);
  protected readonly isSaving = signal(false);

  /** What is typed to find the client; the chosen id goes into `clientId`. */
  protected readonly clientSearch = new FormControl<string | ClientSummary>('', { nonNullable: true });
  protected readonly form = new FormGroup({
    clientId: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    siteId: new FormControl('', { nonNullable: true }),
    finishSystemId: new FormControl('', { nonNullable: true }),
    label: new FormControl('', { nonNullable: true, validators: [requiredText, Validators.maxLength(SAMPLE_LABEL_MAX)] }),
    notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(SAMPLE_NOTES_MAX)] }),
  });

  constructor() {
    const typed = this.clientSearch.valueChanges.pipe(filter((v): v is string => typeof v === 'string'));
    // Text that no longer names the chosen client un-chooses it (and its sites) at once: the board
    // is never made for a client the box has stopped showing.
    typed.pipe(takeUntilDestroyed(this.destroyRef)).subscribe((text) => {
      const chosen = this.chosen();
      if (chosen && text.trim() !== chosen.name.trim()) this.forgetClient();
    });
    typed
      .pipe(
        map((v) => v.trim()),
        debounceTime(250),
        distinctUntilChanged(),
        switchMap((q) =>
          q.length < 2
            ? of([])
            : this.api.searchClients(q).pipe(
                map((page) => page.items),
                catchError(() => of([])),
              ),
        ),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe((items) => this.clientOptions.set(items));
  }

  protected fieldError(name: keyof typeof this.form.controls): string {
    return errorText(this.form.controls[name], {
      required: name === 'clientId' ? 'samples.newBoard.clientRequired' : 'samples.newBoard.labelRequired',
      maxlength: 'samples.newBoard.tooLong',
    });
  }

  protected chooseClient(event: MatAutocompleteSelectedEvent): void {
    const client = event.option.value as ClientSummary;
    this.clientSearch.setValue(client.name, { emitEvent: false });
    this.form.patchValue({ clientId: client.id, siteId: '' });
    this.chosen.set({ id: client.id, name: client.name });
  }

  private forgetClient(): void {
    this.chosen.set(null);
    this.form.patchValue({ clientId: '', siteId: '' });
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const v = this.form.getRawValue();
    this.isSaving.set(true);
    this.message.set(null);
    try {
      const board = await this.api.create({
        clientId: v.clientId,
        label: v.label.trim(),
        notes: v.notes,
        ...(v.siteId ? { siteId: v.siteId } : {}),
        ...(v.finishSystemId ? { finishSystemId: v.finishSystemId } : {}),
      });
      this.snackBar.open(
        this.translate.instant('samples.newBoard.added', { label: board.label }) as string,
        this.translate.instant('samples.common.close') as string,
        {
          duration: 4000,
        },
      );
      await this.router.navigate(['/samples', board.id]);
    } catch (error) {
      this.message.set(applyProblem(this.form, toProblem(error)));
    } finally {
      this.isSaving.set(false);
    }
  }
}
