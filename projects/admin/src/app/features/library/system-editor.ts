import { LiveAnnouncer } from '@angular/cdk/a11y';
import { CdkDrag, CdkDragDrop, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, DestroyRef, Injector, afterNextRender, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { DOCUMENT } from '@angular/common';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { FINISH_SYSTEM_LIMITS as L, type FinishSystemView, type ProductView } from '@layerbook/contracts/types';
import { totalWaitHours } from '@layerbook/domain';
import { Language } from '../../../../../shared/i18n/language';
import { map, startWith } from 'rxjs';
import { Session } from '../../core/auth/session';
import { applyProblem } from '../../core/errors/apply-problem';
import { toProblem } from '../../core/errors/problem';
import { errorText } from '../../shared/forms/error-text';
import { hydratedSignal } from '../../shared/forms/hydrated';
import { requiredText } from '../../shared/forms/text-validators';
import { FormAlert } from '../../shared/ui/form-alert';
import { LayerCard, type ProductChoice } from './layer-card';
import { type LayerGroup, layerGroup, problemForForm, toLayer } from './layer-form';
import { LibraryApi } from './library-api';
import { waitWords } from './library-words';

/** One finish system: its layers in order, edited as a whole and saved in one request (nothing half-saved). */
@Component({
  selector: 'lb-system-editor',
  imports: [
    CdkDrag,
    CdkDropList,
    FormAlert,
    LayerCard,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './system-editor.html',
  styleUrl: './system-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SystemEditor {
  private readonly api = inject(LibraryApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly router = inject(Router);
  private readonly session = inject(Session);
  private readonly announcer = inject(LiveAnnouncer);
  private readonly injector = inject(Injector);
  private readonly document = inject(DOCUMENT);
  private readonly language = inject(Language);
  private readonly translate = inject(TranslateService);

  protected readonly isReadOnly = computed(() => !this.session.hasRole('office'));
  protected readonly isHydrated = hydratedSignal();
  protected readonly isLoading = signal(true);
  protected readonly isBusy = signal(false);
  protected readonly formMessage = signal<string | null>(null);
  protected readonly savedNote = signal<string | null>(null);
  protected readonly system = signal<FinishSystemView | null>(null);
  protected readonly products = signal<readonly ProductView[]>([]);
  protected readonly errorText = errorText;
  /** Keys of the library's words per validator, with the params they name. */
  protected readonly words = {
    name: { required: 'library.systemEditor.errors.nameRequired', maxlength: 'library.common.atMostChars' },
    description: { maxlength: 'library.common.atMostChars' },
  };
  protected readonly limits = { max: L.nameMax };
  protected readonly descriptionLimits = { max: L.descriptionMax };
  protected readonly dragDelay = { touch: 300, mouse: 0 };

  protected readonly form = this.fb.group({
    name: ['', [requiredText, Validators.maxLength(L.nameMax)]],
    description: ['', Validators.maxLength(L.descriptionMax)],
    layers: this.fb.array<LayerGroup>([]),
  });

  private readonly formValue = toSignal(
    this.form.valueChanges.pipe(
      startWith(null),
      map(() => this.form.getRawValue()),
    ),
  );
  protected readonly layerCount = computed(() => this.formValue()?.layers.length ?? 0);
  /** The same sum the library shows for a saved system, over the layers as typed (a blank wait counts as none). */
  protected readonly totalWait = computed(() => {
    const hours = totalWaitHours((this.formValue()?.layers ?? []).map((l) => ({ waitHoursAfter: l.waitHoursAfter ?? 0 })));
    const words = waitWords(hours, this.language.locale());
    return this.text(words.key, words.params);
  });
  protected readonly isNew = computed(() => this.system() === null);

  /** Current products, plus any archived one this system still names, so its select shows a name. */
  protected readonly productChoices = computed<ProductChoice[]>(() => {
    this.language.current(); // the labels follow a language switch
    const choices: ProductChoice[] = this.products().map((p) => ({
      id: p.id,
      label: this.text('library.systemEditor.productChoice', { name: p.name, unit: this.text(`library.unitSymbols.${p.unit}`) }),
    }));
    for (const used of this.system()?.usesProducts ?? []) {
      if (!choices.some((c) => c.id === used.id)) {
        choices.push({ id: used.id, label: this.text('library.systemEditor.archivedProduct', { name: used.name }) });
      }
    }
    return choices;
  });

  constructor() {
    inject(ActivatedRoute)
      .paramMap.pipe(takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((params) => void this.load(params.get('id')));
  }

  protected addLayer(): void {
    const group = layerGroup(this.fb);
    this.form.controls.layers.push(group);
    this.focusLater(`layer-${group.controls.id.value}-heading`);
  }

  protected removeLayer(index: number): void {
    const name = this.form.controls.layers.at(index).controls.name.value || this.text('library.systemEditor.layerN', { n: index + 1 });
    this.form.controls.layers.removeAt(index);
    void this.announcer.announce(this.text('library.systemEditor.removed', { name }));
  }

  protected dropLayer(event: CdkDragDrop<unknown>): void {
    this.moveLayer(event.previousIndex, event.currentIndex);
  }

  /** Same move for drag and drop and for the keyboard buttons; focus stays on the moved layer's button. */
  protected moveLayer(from: number, to: number, via?: 'up' | 'down'): void {
    const layers = this.form.controls.layers;
    if (from === to || to < 0 || to >= layers.length) return;
    const group = layers.at(from);
    layers.removeAt(from, { emitEvent: false });
    layers.insert(to, group);
    const name = group.controls.name.value || this.text('library.systemEditor.theLayer');
    void this.announcer.announce(this.text('library.systemEditor.moved', { name, n: to + 1, count: layers.length }));
    if (via) {
      const id = group.controls.id.value;
      const atEnd = (via === 'up' && to === 0) || (via === 'down' && to === layers.length - 1);
      this.focusLater(`layer-${id}-${atEnd ? (via === 'up' ? 'down' : 'up') : via}`);
    }
  }

  protected async saveSystem(): Promise<void> {
    this.formMessage.set(null);
    this.savedNote.set(null);
    if (this.form.controls.layers.length === 0) {
      this.formMessage.set(this.text('library.systemEditor.needsLayer'));
      return;
    }
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.formMessage.set(this.text('library.systemEditor.needsAttention'));
      return;
    }
    this.isBusy.set(true);
    try {
      const v = this.form.getRawValue();
      const body = { name: v.name.trim(), description: v.description.trim(), layers: this.form.controls.layers.controls.map(toLayer) };
      const current = this.system();
      const saved = current ? await this.api.updateSystem(current.id, body) : await this.api.createSystem(body);
      this.savedNote.set(this.text('library.systemEditor.saved', { name: saved.name }));
      if (!current) {
        await this.router.navigate(['/library/systems', saved.id], { replaceUrl: true });
      } else {
        this.show(saved);
      }
    } catch (error) {
      this.formMessage.set(applyProblem(this.form, problemForForm(toProblem(error))));
    } finally {
      this.isBusy.set(false);
    }
  }

  protected async setArchived(isArchived: boolean): Promise<void> {
    const current = this.system();
    if (!current) return;
    await this.runAction(async () => {
      this.show(await this.api.setSystemArchived(current.id, isArchived));
      this.savedNote.set(this.text(isArchived ? 'library.systemEditor.archivedNote' : 'library.systemEditor.backNote'));
    });
  }

  protected async duplicate(): Promise<void> {
    const current = this.system();
    if (!current) return;
    await this.runAction(async () => {
      const copy = await this.api.duplicateSystem(current.id);
      await this.router.navigate(['/library/systems', copy.id]);
    });
  }

  private async runAction(action: () => Promise<void>): Promise<void> {
    this.formMessage.set(null);
    this.savedNote.set(null);
    this.isBusy.set(true);
    try {
      await action();
    } catch (error) {
      const problem = toProblem(error);
      this.formMessage.set(problem.detail ?? problem.title);
    } finally {
      this.isBusy.set(false);
    }
  }

  private async load(id: string | null): Promise<void> {
    this.isLoading.set(true);
    this.formMessage.set(null);
    try {
      const [products, system] = await Promise.all([this.api.products(), id ? this.api.system(id) : Promise.resolve(null)]);
      this.products.set(products);
      if (system) {
        this.show(system);
      } else {
        this.system.set(null);
        this.form.reset({ name: '', description: '' });
        this.form.controls.layers.clear();
        this.form.controls.layers.push(layerGroup(this.fb));
      }
      if (this.isReadOnly()) this.form.disable({ emitEvent: false });
    } catch (error) {
      this.formMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }

  private show(system: FinishSystemView): void {
    this.system.set(system);
    this.form.controls.layers.clear({ emitEvent: false });
    for (const layer of system.layers) this.form.controls.layers.push(layerGroup(this.fb, layer), { emitEvent: false });
    this.form.reset({ name: system.name, description: system.description });
    if (this.isReadOnly() || system.archivedAt) this.form.disable({ emitEvent: false });
    else this.form.enable({ emitEvent: false });
    // enable() turns on every control; the layer groups turn their unused parts off again.
    for (const layer of this.form.controls.layers.controls) {
      layer.controls.source.setValue(layer.controls.source.value);
      layer.controls.isPerCoat.setValue(layer.controls.isPerCoat.value);
    }
  }

  /** Words for text made here (announcements, notes, pick-list labels) in the current language. */
  private text(key: string, params?: Record<string, unknown>): string {
    return this.translate.instant(key, params) as string;
  }

  private focusLater(elementId: string): void {
    afterNextRender(() => this.document.getElementById(elementId)?.focus(), { injector: this.injector });
  }
}
