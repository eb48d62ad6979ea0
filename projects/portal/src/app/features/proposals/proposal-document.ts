import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { ProposalSnapshot, SnapshotOption } from '@layerbook/contracts/types';
import { LbDatePipe, LbMoneyPipe } from '../../../../../shared/i18n/format';
import { Language } from '../../../../../shared/i18n/language';
import { type CautionSay, cautionView, leadNoticeView, standingView } from './caution-words';
import { paymentTermsSentence } from './terms-words';

/** The proposal as sent, drawn only from its frozen snapshot: what the PDF says, on the page. */
@Component({
  selector: 'lb-proposal-document',
  imports: [LbDatePipe, LbMoneyPipe, MatIconModule, TranslatePipe],
  templateUrl: './proposal-document.html',
  styleUrl: './proposal-document.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalDocument {
  private readonly translate = inject(TranslateService);
  private readonly language = inject(Language);

  readonly snapshot = input.required<ProposalSnapshot>();
  /** the option the client accepted, shown as chosen */
  readonly chosenOptionId = input<string | null>(null);
  /** the add-ons the client took with it, shown as chosen */
  readonly chosenAddOnIds = input<readonly string[]>([]);

  protected readonly optionLabels = computed(() => new Map(this.snapshot().options.map((o) => [o.id, o.label])));

  /** Words of the shared `cautions` area; null when the reader's words lack the key (the English stays). */
  private readonly sayCaution: CautionSay = (key, params) => {
    const full = `cautions.${key}`;
    const text = this.translate.instant(full, params) as string;
    return text === full ? null : text;
  };

  /** The lead-safe notice's own words (`proposals.leadNotice.<key>`), or null when the reader's words lack one. */
  private readonly sayLead = (key: string): string | null => {
    const full = `proposals.leadNotice.${key}`;
    const text = String(this.translate.instant(full));
    return text === full ? null : text;
  };

  /** Cautions and terms in the reader's language (recomputed on a language switch). */
  protected readonly words = computed(() => {
    this.language.current();
    const s = this.snapshot();
    return {
      terms: paymentTermsSentence(
        s.terms,
        (key, params) => this.translate.instant(`proposals.${key}`, params) as string,
        this.language.locale(),
      ),
      lead: s.leadNotice ? leadNoticeView(s.leadNotice, this.sayCaution, this.sayLead) : null,
      cautions: s.safety.cautions.map((c) => ({ id: c.id, ...cautionView(c.id, c, this.sayCaution) })),
      standing: standingView(s.safety.standing, this.sayCaution),
    };
  });

  protected isChosen(option: SnapshotOption): boolean {
    return option.id === this.chosenOptionId();
  }

  protected isAddOnChosen(id: string): boolean {
    return this.chosenAddOnIds().includes(id);
  }
}
