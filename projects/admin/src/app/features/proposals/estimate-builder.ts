import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  LOCALE_ID,
  OnInit,
  computed,
  inject,
  input,
  linkedSignal,
  signal,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { EstimateView } from '@layerbook/contracts/types';
import { ASK_FOR_YEAR, DomainInputError, measureSurface, measureText, type EstimateResultJson } from '@layerbook/domain';
import { merge } from 'rxjs';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { FormAlert } from '../../shared/ui/form-alert';
import { AddOnsSection } from './addons-section';
import { EstimateApi } from './estimate-api';
import { MAX_OPTIONS, NOTES_MAX, WORDS, estimateForm, fillForm, nextOptionId, optionGroup, readInputs } from './estimate-form';
import { SAVED_WORDS, readOnlyReason, statusWord } from './estimate-words';
import { type HoldsUnsavedChanges } from './leave-estimate-guard';
import { afterSaveAnswer, isSavedByOther } from './save-answer';
import { ExtrasFields } from './extras-fields';
import { applySaveProblem, targetKey } from './field-targets';
import { LabourSection } from './labour-section';
import { type LiveAttempt, computeLive } from './live-estimate';
import { MaterialsSection } from './materials-section';
import { PriceSection } from './price-section';
import { SafetySection } from './safety-section';
import { ScheduleSection } from './schedule-section';
import { SurfaceFinishes } from './surface-finishes';
import { dateTimeFormat } from '../../../../../shared/i18n/format/intl-cache';

type Shown =
  | { readonly source: 'server' | 'live'; readonly result: EstimateResultJson }
  | { readonly source: 'stale'; readonly result: EstimateResultJson | null; readonly message: string };

/**
 * The estimate builder: the office chooses finishes per surface in up to four options and adds
 * the extras; the numbers are recomputed in the browser on every change with the same engine
 * the server uses, and Save stores the server's own numbers.
 */
@Component({
  selector: 'lb-estimate-builder',
  imports: [
    AddOnsSection,
    ExtrasFields,
    FormAlert,
    LabourSection,
    MatButtonModule,
    MatCheckboxModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MaterialsSection,
    PriceSection,
    ReactiveFormsModule,
    RouterLink,
    SafetySection,
    ScheduleSection,
    SurfaceFinishes,
    TranslatePipe,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './estimate-builder.html',
  styleUrl: './estimate-builder.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(window:beforeunload)': 'warnBeforeUnload($event)' },
})
export class EstimateBuilder implements OnInit, HoldsUnsavedChanges {
  private readonly translate = inject(TranslateService);
  private readonly api = inject(EstimateApi);
  private readonly locale = inject(LOCALE_ID);

  /** From the route (withComponentInputBinding). */
  readonly id = input.required<string>();

  protected readonly form = estimateForm();
  protected readonly isHydrated = hydratedSignal();
  protected readonly view = signal<EstimateView | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly isSaving = signal(false);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly justSaved = signal(false);
  /** the last save was refused because someone else saved since this copy was loaded: offer to reload */
  protected readonly isSavedByOther = signal(false);
  protected readonly currentIndex = signal(0);
  protected readonly maxOptions = MAX_OPTIONS;
  protected readonly notesMax = NOTES_MAX;
  protected readonly noNotes: ReadonlyMap<string, string> = new Map();
  protected readonly words = WORDS;
  protected readonly errorText = errorText;
  protected readonly statusWord = statusWord;
  protected readonly savedWords = SAVED_WORDS;
  /** an unknown year with paint disturbed is treated as pre-1978 until the site records it */
  protected readonly askForYear = ASK_FOR_YEAR;
  /** bumps on every value or status change of the form: the signals below read the form through it */
  protected readonly revision = signal(0);
  private readonly baseline = signal('');

  protected readonly context = computed(() => this.view()?.context ?? null);
  /** An accepted estimate opens read-only, saying why (the server refuses changes too). */
  protected readonly readOnlyReason = computed(() => {
    const view = this.view();
    return view ? readOnlyReason(view.status) : null;
  });
  protected readonly options = computed(() => {
    this.revision();
    return [...this.form.controls.variants.controls];
  });
  protected readonly currentOption = computed(() => this.options()[Math.min(this.currentIndex(), this.options().length - 1)] ?? null);
  protected readonly currentLabel = computed(() => {
    this.revision();
    return this.currentOption()?.getRawValue().label ?? '';
  });
  private readonly currentOptionId = computed(() => this.currentOption()?.controls.id.value ?? 'A');
  protected readonly isDirty = computed(() => {
    this.revision();
    return this.view() !== null && JSON.stringify(this.form.getRawValue()) !== this.baseline();
  });

  /** surface id → its measured area or length, from the takeoff shape */
  protected readonly measures = computed(() => {
    const context = this.context();
    const out = new Map<string, string>();
    if (!context) return out;
    const takeoff = { minDeductedOpeningArea: context.settings.minDeductedOpeningArea };
    for (const room of context.rooms) {
      for (const s of room.surfaces) {
        try {
          const m = measureSurface(s.shape, takeoff);
          out.set(s.id, this.say('proposals.builder.measured', { measure: measureText(m, context.lengthUnit) }));
        } catch (error) {
          if (!(error instanceof DomainInputError)) throw error;
          out.set(s.id, this.say('proposals.builder.cannotMeasure', { message: error.message }));
        }
      }
    }
    return out;
  });

  private readonly attempt = computed<LiveAttempt | null>(() => {
    this.revision();
    const context = this.context();
    if (!context) return null;
    const variantId = this.currentOptionId();
    if (this.form.invalid) return { kind: 'waiting', variantId, message: this.say('proposals.builder.fixFields') };
    return computeLive(context, readInputs(this.form, context), variantId);
  });

  /** The last numbers the engine gave for this option, kept while a change cannot be priced. */
  private readonly lastGood = linkedSignal<LiveAttempt | null, { variantId: string; result: EstimateResultJson } | null>({
    source: this.attempt,
    computation: (attempt, previous) => {
      if (attempt?.kind === 'ok') return { variantId: attempt.variantId, result: attempt.result };
      const kept = previous?.value;
      return kept && attempt && kept.variantId === attempt.variantId ? kept : null;
    },
  });

  private readonly savedResult = computed(() => this.view()?.result?.variants.find((v) => v.id === this.currentOptionId())?.result ?? null);

  protected readonly shown = computed<Shown | null>(() => {
    const saved = this.savedResult();
    if (saved && !this.isDirty()) return { source: 'server', result: saved };
    const attempt = this.attempt();
    if (!attempt) return null;
    if (attempt.kind === 'ok') return { source: 'live', result: attempt.result };
    const message =
      attempt.kind === 'refused' && attempt.target.kind === 'top' ? `${attempt.target.prefix}${attempt.message}` : attempt.message;
    return { source: 'stale', result: this.lastGood()?.result ?? saved, message };
  });

  /** Live engine messages beside the field they name. */
  protected readonly notes = computed(() => {
    const attempt = this.attempt();
    const out = new Map<string, string>();
    if (attempt?.kind === 'refused' && attempt.target.kind !== 'top') out.set(targetKey(attempt.target), attempt.message);
    return out;
  });

  protected readonly computedAt = computed(() => {
    const at = this.view()?.computedAt;
    return at ? dateTimeFormat(this.locale, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(at)) : '';
  });

  /** The equipment lines as typed, for the safety section's scaffold warning. */
  protected readonly equipment = computed(() => {
    this.revision();
    const context = this.context();
    return context ? readInputs(this.form, context).equipment : [];
  });

  protected readonly perAreaRates = computed(() => {
    this.revision();
    const context = this.context();
    return context ? readInputs(this.form, context).perAreaRates : {};
  });

  constructor() {
    merge(this.form.valueChanges, this.form.statusChanges)
      .pipe(takeUntilDestroyed(inject(DestroyRef)))
      .subscribe(() => this.revision.update((n) => n + 1));
  }

  ngOnInit(): void {
    void this.load();
  }

  /** For the route's leave guard: typing not saved yet (an accepted, read-only estimate has none). */
  hasUnsavedChanges(): boolean {
    return this.isDirty() && !this.readOnlyReason();
  }

  /** Closing the tab or reloading with unsaved changes: the browser asks, in its own words. */
  protected warnBeforeUnload(event: BeforeUnloadEvent): void {
    if (this.hasUnsavedChanges()) event.preventDefault();
  }

  /** After someone else's save: their copy replaces this one (the typing here is given up). */
  protected async reload(): Promise<void> {
    this.isSavedByOther.set(false);
    this.formMessage.set(null);
    this.isLoading.set(true);
    await this.load();
  }

  protected selectOption(index: number): void {
    this.currentIndex.set(index);
  }

  /** Arrow keys move between option tabs, as in any tab list. */
  protected moveBetweenOptions(event: KeyboardEvent, index: number): void {
    const count = this.options().length;
    const step = event.key === 'ArrowRight' ? 1 : event.key === 'ArrowLeft' ? -1 : 0;
    if (step === 0) return;
    event.preventDefault();
    const next = (index + step + count) % count;
    this.currentIndex.set(next);
    (event.currentTarget as HTMLElement).parentElement?.querySelectorAll<HTMLElement>('[role="tab"]')[next]?.focus();
  }

  protected optionNeedsAttention(index: number): boolean {
    this.revision();
    const option = this.form.controls.variants.at(index);
    return !!option && option.invalid && option.touched;
  }

  /** A new option starts from the current option's finishes. */
  protected addOption(): void {
    const context = this.context();
    const options = this.form.controls.variants;
    const current = this.currentOption();
    if (!context || !current || options.length >= MAX_OPTIONS) return;
    const id = nextOptionId(options.controls.map((o) => o.controls.id.value));
    options.push(optionGroup(context, id, `Option ${id}`, current.controls.finishes.getRawValue()));
    this.currentIndex.set(options.length - 1);
  }

  protected removeOption(): void {
    const options = this.form.controls.variants;
    if (options.length <= 1) return;
    options.removeAt(this.currentIndex());
    this.currentIndex.set(Math.max(0, Math.min(this.currentIndex(), options.length - 1)));
  }

  protected async save(): Promise<void> {
    const view = this.view();
    if (!view || this.readOnlyReason()) return;
    this.formMessage.set(null);
    this.justSaved.set(false);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.revision.update((n) => n + 1);
      this.formMessage.set(this.say('proposals.builder.needsAttentionBanner'));
      return;
    }
    const sent = readInputs(this.form, view.context);
    const sentForm = JSON.stringify(this.form.getRawValue());
    this.isSaving.set(true);
    this.isSavedByOther.set(false);
    try {
      const saved = await this.api.saveInputs(view.id, sent, view.computedAt);
      if (afterSaveAnswer(sentForm, JSON.stringify(this.form.getRawValue())) === 'refill') {
        this.show(saved);
        this.justSaved.set(true);
      } else {
        this.keepTyped(saved, sentForm);
      }
    } catch (error) {
      const problem = toProblem(error);
      this.isSavedByOther.set(isSavedByOther(problem));
      this.formMessage.set(applySaveProblem(this.form, view.context, sent, problem));
      this.revision.update((n) => n + 1);
    } finally {
      this.isSaving.set(false);
    }
  }

  private say(key: string, params?: Record<string, unknown>): string {
    return String(this.translate.instant(key, params));
  }

  private async load(): Promise<void> {
    try {
      this.show(await this.api.get(this.id()));
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }

  /**
   * A save answered while the office kept typing: the typing stays, the form still counts as unsaved
   * (measured against what was sent, which is what the server now holds) and the next save sends it.
   */
  private keepTyped(saved: EstimateView, sentForm: string): void {
    this.baseline.set(sentForm);
    this.view.set(saved);
    this.revision.update((n) => n + 1);
  }

  /** Shows what the server holds: its inputs in the form, its numbers on the right. */
  private show(view: EstimateView): void {
    fillForm(this.form, view.context, view.inputs);
    if (readOnlyReason(view.status)) this.form.disable({ emitEvent: false });
    this.baseline.set(JSON.stringify(this.form.getRawValue()));
    this.view.set(view);
    this.currentIndex.update((i) => Math.min(i, this.form.controls.variants.length - 1));
    this.revision.update((n) => n + 1);
  }
}
