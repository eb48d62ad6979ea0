import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  Injector,
  Signal,
  afterNextRender,
  computed,
  inject,
  signal,
} from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Title } from '@angular/platform-browser';
import { ActivatedRoute, Router } from '@angular/router';
import { BUDGET_RANGES, PUBLIC_SOURCES, isReferralSource, type FieldProblem, type Problem } from '@layerbook/contracts/types';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import type { FirmLookup } from './firm-lookup';
import { InquiryApi } from './inquiry-api';
import { INQUIRY_WORDS, fromPosted, inquiryForm, linkDependentFields, markRefused, renewedStamp, toBody } from './inquiry-form-model';
import { postedRefusal, type PostedRefusal } from './posted-refusal';
import { PublicFrame } from './public-frame';
import { followTypingBeforeWaking, typedBeforeHydration } from './typed-before-hydration';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { SayPipe } from '../../../../../shared/errors/say-pipe';
import { FieldErrorPipe } from '../../../../../shared/forms/field-error-pipe';
import { provideFieldDefaults } from '../../../../../shared/app/field-defaults';
import { WakeTogether } from '../../../../../shared/hydration/wake-together';

const FORM_ID = 'inquiry-form';
const CHECK_FIELDS = 'inquiry.page.checkFields';
const STALE_FORM = 'inquiry.page.staleForm';
/** `Event.eventPhase` of an event Angular replays after hydration (EventPhase.REPLAY). */
const REPLAYED = 101;

/**
 * A firm's public inquiry form. It is a plain HTML form that posts without scripts (the host
 * files it, or renders this page again with the refusal); once hydrated, it sends JSON instead.
 */
@Component({
  selector: 'lb-inquiry-page',
  providers: [provideFieldDefaults()],
  imports: [
    FieldErrorPipe,
    FormAlert,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    PublicFrame,
    ReactiveFormsModule,
    SayPipe,
    TranslatePipe,
    WakeTogether,
  ],
  templateUrl: './inquiry-page.html',
  styleUrl: './inquiry-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryPage {
  private readonly api = inject(InquiryApi);
  private readonly router = inject(Router);
  private readonly injector = inject(Injector);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly route = inject(ActivatedRoute).snapshot;
  private readonly translate = inject(TranslateService);

  protected readonly slug = this.route.paramMap.get('slug') ?? '';
  protected readonly lookup = this.route.data['lookup'] as FirmLookup;
  protected readonly firm = this.lookup.kind === 'found' ? this.lookup.firm : null;
  protected readonly action = `/portal/f/${encodeURIComponent(this.slug)}/inquiry`;
  protected readonly formId = FORM_ID;

  protected readonly form = inquiryForm(this.firm?.formStamp ?? '');
  protected readonly words = INQUIRY_WORDS;
  protected readonly budgets = BUDGET_RANGES;
  protected readonly sources = PUBLIC_SOURCES;
  protected readonly isHydrated = hydratedSignal();
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);

  protected readonly isReferralChosen: Signal<boolean>;
  /**
   * Without scripts the referrer field is always there; once hydrated, only when it is asked for
   * (or holds words, or a message).
   */
  protected readonly showReferrer: Signal<boolean>;

  constructor() {
    const title = pageTitle(this.lookup);
    inject(Title).setTitle(this.translate.instant(title.key, title.params) as string);
    const refusal = postedRefusal();
    const typed = typedBeforeHydration(FORM_ID);
    let value = this.form.getRawValue();
    if (refusal) {
      value = fromPosted(withRenewedStamp(refusal, value.startedAt), value);
    }
    if (typed) {
      value = fromPosted(typed, value, 'keep');
    }
    this.form.setValue(value);
    followTypingBeforeWaking(this.host.nativeElement, this.form);
    if (refusal) {
      this.showRefusal(refusal);
    }

    const links = linkDependentFields(this.form);
    inject(DestroyRef).onDestroy(() => links.unsubscribe());
    const heardFrom = this.form.controls.heardFrom;
    const referrerName = this.form.controls.referrerName;
    const chosen = toSignal(heardFrom.valueChanges, { initialValue: heardFrom.value });
    const referrer = toSignal(referrerName.valueChanges, { initialValue: referrerName.value });
    const referrerStatus = toSignal(referrerName.statusChanges, { initialValue: referrerName.status });
    this.isReferralChosen = computed(() => isReferralSource(chosen()));
    this.showReferrer = computed(
      () => !this.isHydrated() || this.isReferralChosen() || referrer().trim() !== '' || referrerStatus() === 'INVALID',
    );
  }

  /**
   * Server rendering does not carry a select's value into the HTML, so the chosen option is
   * marked by hand: a refused post shows the prospect's choice again before any script runs.
   */
  protected isChosen(name: 'budgetRange' | 'heardFrom', value: string): '' | null {
    return this.form.controls[name].value === value ? '' : null;
  }

  /** The consent box is not a form field, so its message is placed by hand. */
  protected isConsentMissing(): boolean {
    const consent = this.form.controls.consent;
    return consent.invalid && consent.touched;
  }

  protected async sendInquiry(event: Event | undefined): Promise<void> {
    // Sent before hydration, the form has already gone as a plain post: do not send it twice.
    if (event?.eventPhase === REPLAYED || this.isBusy() || !this.firm) {
      return;
    }
    this.formMessage.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.formMessage.set(this.say(CHECK_FIELDS));
      this.focusFirstProblem();
      return;
    }
    this.isBusy.set(true);
    try {
      await this.api.send(this.slug, toBody(this.form.getRawValue()));
      await this.router.navigate(['/f', this.slug, 'inquiry', 'thanks']);
    } catch (error) {
      const problem = toProblem(error);
      this.showProblem(problem);
      if (problem.errors?.some(isStampProblem)) {
        await this.renewStamp();
      }
      this.focusFirstProblem();
    } finally {
      this.isBusy.set(false);
    }
  }

  /**
   * Each message stays beside its field for as long as the field holds what was refused. A
   * validator rather than setErrors: the form directives re-run validation when they attach
   * (after this constructor), and a visitor who changed a field before hydration has answered it.
   */
  private showRefusal(refusal: PostedRefusal): void {
    const sent = fromPosted(refusal.values, this.form.getRawValue());
    const unplaced: string[] = [];
    let placedAny = false;
    for (const problem of refusal.errors) {
      const { field, message } = problem;
      if (isStampProblem(problem)) {
        continue;
      }
      if (!isFieldOf(sent, field)) {
        unplaced.push(message);
        continue;
      }
      markRefused(this.form, sent, field);
      placedAny = true;
    }
    this.formMessage.set(this.summary(placedAny, unplaced.join(' '), refusal.errors.some(isStampProblem)));
  }

  /** An answer to a JSON send: messages beside fields until the visitor edits them. */
  private showProblem(problem: Problem): void {
    const errors = problem.errors ?? [];
    const fieldErrors = errors.filter((item) => !isStampProblem(item));
    const isStale = fieldErrors.length < errors.length;
    if (isStale && fieldErrors.length === 0) {
      this.formMessage.set(this.summary(false, null, true));
      return;
    }
    const placedAny = fieldErrors.some(({ field }) => field in this.form.controls);
    const unplaced = applyProblem(this.form, { ...problem, errors: fieldErrors });
    this.formMessage.set(this.summary(placedAny, unplaced, isStale));
  }

  private async renewStamp(): Promise<void> {
    try {
      const fresh = (await this.api.firm(this.slug)).formStamp;
      this.form.patchValue(renewedStamp(this.form.getRawValue(), fresh));
    } catch {
      this.formMessage.set(this.say('inquiry.page.expired'));
    }
  }

  private say(key: string): string {
    return this.translate.instant(key) as string;
  }

  /** What the alert at the top says: where to look, what no field shows, and a renewed form. */
  private summary(placedAny: boolean, unplaced: string | null, isStale: boolean): string | null {
    const parts = [placedAny ? this.say(CHECK_FIELDS) : '', unplaced ?? '', isStale ? this.say(STALE_FORM) : ''].filter(
      (part) => part !== '',
    );
    return parts.length > 0 ? parts.join(' ') : null;
  }

  private focusFirstProblem(): void {
    afterNextRender(
      () => {
        const field = this.host.nativeElement.querySelector<HTMLElement>(
          'input.ng-invalid:not([type="hidden"]), textarea.ng-invalid, select.ng-invalid, mat-checkbox.ng-invalid input',
        );
        field?.focus();
      },
      { injector: this.injector },
    );
  }
}

function pageTitle(lookup: FirmLookup): { key: string; params?: Record<string, string> } {
  if (lookup.kind === 'found') {
    return { key: 'inquiry.page.title', params: { firm: lookup.firm.name } };
  }
  return { key: lookup.kind === 'missing' ? 'inquiry.page.titleMissing' : 'inquiry.page.titleForm' };
}

/** The form stamp is a hidden field: its problem is said at the top, not beside a field. */
function isStampProblem({ field }: FieldProblem): boolean {
  return field === 'startedAt';
}

function isFieldOf<T extends object>(value: T, field: string): field is Extract<keyof T, string> {
  return field in value;
}

/**
 * An expired stamp is not sent back into the page as its stamp: the page already carries a fresh one.
 * It goes along as the renewed one instead, as a renewal after a JSON send does (renewedStamp).
 */
function withRenewedStamp(refusal: PostedRefusal, freshStamp: string): Record<string, string> {
  if (!refusal.errors.some(isStampProblem)) {
    return refusal.values;
  }
  const values = { startedAt: '', renewedFrom: '', ...refusal.values };
  return { ...values, ...renewedStamp(values, freshStamp) };
}
