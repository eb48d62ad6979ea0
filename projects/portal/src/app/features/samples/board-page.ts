import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, RESPONSE_INIT, computed, effect, inject, input, signal } from '@angular/core';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { SAMPLE_COMMENT_MAX, type ClientBoardView } from '@layerbook/contracts/types';
import { PhotoGallery } from '../../../../../shared/photos/photo-gallery';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { focusAfterRender } from '../../shared/ui/focus-after-render';
import { BoardApi, boardUrl } from './board-api';
import { BOARD_STATUS_WORDS } from './board-words';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { Language } from '../../../../../shared/i18n/language';
import { FieldErrorPipe, type FieldErrorWords } from '../../../../../shared/forms/field-error-pipe';
import { LbDatePipe } from '../../../../../shared/i18n/format';

/** Spaces alone are not a request; the server trims before it checks. */
const notBlank = (c: AbstractControl<string>) => (typeof c.value === 'string' && c.value.trim() ? null : { required: true });

/** One sample board: its photos and finish in plain words, then approve it or ask for changes (once). */
@Component({
  selector: 'lb-board-page',
  imports: [
    FieldErrorPipe,
    LbDatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    PhotoGallery,
    ReactiveFormsModule,
    RouterLink,
    SayPipe,
    TranslatePipe,
  ],
  template: `
    <section class="lb-page">
      <p>
        <a routerLink="/boards">{{ 'samples.board.all' | translate }}</a>
      </p>
      @if (board(); as b) {
        <h1>{{ b.label }}</h1>
        <p class="meta">
          {{ 'samples.board.from' | translate: { firm: b.firmName } }}
          @if (b.round > 1) {
            <span>{{ 'samples.board.round' | translate: { round: b.round } }}</span>
          }
        </p>

        <!-- in the page before the answer and filled by it, so screen readers read it; focus moves here -->
        <div class="outcome" role="status" tabindex="-1">
          @switch (b.status) {
            @case ('approved') {
              <p class="decided">
                <mat-icon aria-hidden="true">verified</mat-icon>
                {{ 'samples.board.approved' | translate: { day: b.decidedAt | lbDate: 'long' : null : b.timeZone, firm: b.firmName } }}
              </p>
            }
            @case ('changes_requested') {
              <div class="decided">
                <p>
                  <mat-icon aria-hidden="true">edit_note</mat-icon>
                  {{ 'samples.board.changes' | translate: { day: b.decidedAt | lbDate: 'long' : null : b.timeZone, firm: b.firmName } }}
                </p>
                <p class="comment">{{ 'proposals.page.youWrote' | translate: { comment: b.clientComment } }}</p>
              </div>
            }
          }
        </div>
        @if (b.status === 'shown') {
          <p class="status">
            <mat-icon aria-hidden="true">{{ words.shown.icon }}</mat-icon> {{ words.shown.text | translate }}
          </p>
        }

        <lb-photo-gallery [subject]="b.label" [photos]="b.photos" [readOnly]="true" [thumbHeight]="180" />

        <section aria-labelledby="finish-heading">
          <h2 id="finish-heading">{{ 'samples.board.finish' | translate }}</h2>
          @if (b.finishName) {
            <p>{{ 'samples.board.inOrder' | translate: { finish: b.finishName } }}</p>
            <!-- Each step carries its number in its words ("1. Base coat: …"), so the list draws no marker of its own. -->
            <ol class="steps">
              @for (step of b.finishSteps; track $index) {
                <li>{{ step }}</li>
              }
            </ol>
          } @else {
            <p>{{ 'samples.board.finishLater' | translate: { firm: b.firmName } }}</p>
          }
        </section>

        @if (b.status === 'shown') {
          <section class="answer" aria-labelledby="answer-heading">
            <h2 id="answer-heading">{{ 'proposals.page.answer' | translate }}</h2>
            <p role="alert" class="error">{{ message() | lbSay }}</p>
            @if (isConfirming()) {
              <div class="confirm" role="group" aria-labelledby="confirm-text">
                <p id="confirm-text">{{ 'samples.board.confirm' | translate: { label: b.label } }}</p>
                <button mat-flat-button type="button" data-confirm [disabled]="isBusy()" (click)="approve(b)">
                  {{ 'samples.board.yes' | translate }}
                </button>
                <button mat-button type="button" [disabled]="isBusy()" (click)="stopConfirming()">
                  {{ 'samples.board.notYet' | translate }}
                </button>
              </div>
            } @else if (!isAsking()) {
              <div class="buttons">
                <button mat-flat-button type="button" data-approve (click)="confirmApproval()">
                  <mat-icon aria-hidden="true">check</mat-icon>{{ 'samples.board.approve' | translate }}
                </button>
                <button mat-stroked-button type="button" (click)="askForChanges()">
                  <mat-icon aria-hidden="true">edit_note</mat-icon>{{ 'proposals.answers.askChanges' | translate }}
                </button>
              </div>
            }
            @if (isAsking()) {
              <form [formGroup]="answerForm" (ngSubmit)="requestChanges(b)" novalidate>
                <mat-form-field class="wide">
                  <mat-label>{{ 'proposals.answers.changesLabel' | translate }}</mat-label>
                  <textarea matInput [formControl]="comment" rows="4" [maxlength]="commentMax"></textarea>
                  <mat-hint>{{ 'samples.board.hint' | translate }}</mat-hint>
                  @if (comment.invalid) {
                    <mat-error>{{ comment | lbFieldError: commentWords }}</mat-error>
                  }
                </mat-form-field>
                <div class="buttons">
                  <button mat-flat-button type="submit" [disabled]="isBusy()">{{ 'proposals.answers.send' | translate }}</button>
                  <button mat-button type="button" [disabled]="isBusy()" (click)="isAsking.set(false)">
                    {{ 'billing.decision.cancel' | translate }}
                  </button>
                </div>
              </form>
            }
          </section>
        }
      } @else if (isLoading()) {
        <mat-progress-bar mode="indeterminate" [attr.aria-label]="'samples.board.loading' | translate" />
      } @else {
        <p class="lb-form-alert" role="alert">
          <mat-icon aria-hidden="true">error</mat-icon><span>{{ loadMessage() | lbSay }}</span>
        </p>
      }
    </section>
  `,
  styles: `
    .steps {
      list-style: none;
      padding-left: 0;
    }
    .steps li + li {
      margin-top: 0.35rem;
    }
    .meta {
      color: var(--mat-sys-on-surface-variant);
      margin-top: 0;
    }
    .outcome:focus {
      outline: none;
    }
    .status,
    .decided p:first-child {
      display: flex;
      gap: 0.4rem;
      align-items: center;
    }
    .decided {
      padding: 1rem 1.25rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
    }
    .comment {
      white-space: pre-line;
    }
    .answer {
      margin: 2rem 0 0;
      padding: 1.25rem;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
    }
    .buttons,
    .confirm {
      display: flex;
      flex-wrap: wrap;
      gap: 0.75rem;
      align-items: center;
    }
    .confirm p {
      flex-basis: 100%;
      margin: 0;
    }
    .wide {
      width: 100%;
    }
    .error:empty {
      display: none;
    }
    .error {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardPage {
  private readonly api = inject(BoardApi);
  private readonly title = inject(Title);
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);
  private readonly response = inject(RESPONSE_INIT, { optional: true });
  private readonly focus = focusAfterRender();

  /** route parameter */
  readonly id = input.required<string>();

  /** The server writes the finish steps in the client's language: read again when it changes. */
  private readonly loaded = httpResource<ClientBoardView>(() => {
    this.language.current();
    return boardUrl(this.id());
  });

  protected readonly words = BOARD_STATUS_WORDS;
  protected readonly board = computed(() => (this.loaded.hasValue() ? this.loaded.value() : null));
  protected readonly isLoading = this.loaded.isLoading;
  /** 404 and a malformed id (400, a link cut short) read the same: the link is wrong, or the board is not theirs. */
  private readonly isMissing = computed(() => {
    const error = this.loaded.error();
    return error !== undefined && [400, 404].includes(toProblem(error).status);
  });
  protected readonly loadMessage = computed(() => {
    const error = this.loaded.error();
    if (!error) return null;
    return this.isMissing() ? 'samples.board.missing' : problemMessage(error);
  });
  protected readonly isBusy = signal(false);
  protected readonly isConfirming = signal(false);
  protected readonly isAsking = signal(false);
  /** what went wrong with the answer, said above the buttons */
  protected readonly message = signal<string | null>(null);
  protected readonly commentMax = SAMPLE_COMMENT_MAX;
  protected readonly comment = new FormControl('', { nonNullable: true, validators: [notBlank, Validators.maxLength(SAMPLE_COMMENT_MAX)] });
  /** The form's group: its `ngSubmit` keeps the browser from posting the page (and losing the text) on Send. */
  protected readonly answerForm = new FormGroup({ comment: this.comment });

  constructor() {
    effect(() => {
      const b = this.board();
      this.language.current();
      if (b) this.title.setTitle(this.translate.instant('layout.titles.named', { name: b.label }) as string);
    });
    // Tells crawlers and the host's logs the truth while rendering on the server.
    effect(() => {
      if (this.isMissing() && this.response) this.response.status = 404;
    });
  }

  protected readonly commentWords: FieldErrorWords = {
    maxlength: { key: 'samples.board.tooLong', params: { max: SAMPLE_COMMENT_MAX } },
    required: 'samples.board.commentRequired',
  };

  /** The Approve button gives way to the question: focus goes to its Yes, and back to Approve on Not yet. */
  protected confirmApproval(): void {
    this.isConfirming.set(true);
    this.focus('[data-confirm]');
  }

  protected stopConfirming(): void {
    this.isConfirming.set(false);
    this.focus('[data-approve]');
  }

  protected askForChanges(): void {
    this.isAsking.set(true);
    this.focus('textarea');
  }

  protected async approve(b: ClientBoardView): Promise<void> {
    await this.answer(() => this.api.approve(b.id));
  }

  protected async requestChanges(b: ClientBoardView): Promise<void> {
    this.comment.markAsTouched();
    if (this.comment.invalid) return;
    await this.answer(() => this.api.requestChanges(b.id, { comment: this.comment.value.trim() }));
  }

  private async answer(call: () => Promise<ClientBoardView>): Promise<void> {
    this.isBusy.set(true);
    this.message.set(null);
    try {
      this.loaded.set(await call());
      this.isConfirming.set(false);
      this.isAsking.set(false);
      // The buttons are gone: the answer, now said at the top, takes focus.
      this.focus('.outcome');
    } catch (error) {
      const problem = toProblem(error);
      const field = problem.errors?.find((e) => e.field === 'comment');
      if (field) {
        this.comment.setErrors({ server: field.message });
      } else {
        this.message.set(problem.detail ?? problem.title);
        // Already answered (perhaps in another tab): show the board as it now stands.
        if (problem.status === 409) this.loaded.reload();
      }
    } finally {
      this.isBusy.set(false);
    }
  }
}
