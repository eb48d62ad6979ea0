import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { ProposalSnapshot, SnapshotOption } from '@layerbook/contracts/types';
import { formatDay, formatMoney } from '../../shared/format/money';
import { cautionFootnotes } from './caution-words';
import { paymentTermsSentence } from './terms-words';

/** The proposal as sent, drawn only from its frozen snapshot: what the PDF says, on the page. */
@Component({
  selector: 'lb-proposal-document',
  imports: [MatIconModule],
  templateUrl: './proposal-document.html',
  styleUrl: './proposal-document.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalDocument {
  readonly snapshot = input.required<ProposalSnapshot>();
  /** the option the client accepted, shown as chosen */
  readonly chosenOptionId = input<string | null>(null);

  protected readonly termsSentence = paymentTermsSentence;
  protected readonly footnotes = cautionFootnotes;
  protected readonly optionLabels = computed(() => new Map(this.snapshot().options.map((o) => [o.id, o.label])));

  protected money(amount: string): string {
    const s = this.snapshot();
    return formatMoney(amount, s.currency, s.locale);
  }

  protected day(isoDay: string | null): string {
    return isoDay ? formatDay(isoDay, this.snapshot().locale) : 'On acceptance';
  }

  protected isChosen(option: SnapshotOption): boolean {
    return option.id === this.chosenOptionId();
  }
}
