import { LiveAnnouncer } from '@angular/cdk/a11y';
import { Injectable, inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { TranslateService } from '@ngx-translate/core';
import { firstValueFrom } from 'rxjs';
import { STAGE_LABELS, type InquiryDetail, type InquiryStage, type InquirySummary } from '@layerbook/contracts/types';
import { InquiryApi } from './inquiry-api';
import { LostReasonDialog, type LostReasonData } from './lost-reason-dialog';

/**
 * Moves an inquiry to another stage the same way from the board, its menus and the detail page:
 * asks for a reason before "Lost", then tells screen-reader users what happened.
 */
@Injectable({ providedIn: 'root' })
export class StageMover {
  private readonly translate = inject(TranslateService);
  private readonly api = inject(InquiryApi);
  private readonly dialog = inject(MatDialog);
  private readonly announcer = inject(LiveAnnouncer);

  /** The saved inquiry, or null when the person changed their mind in the lost-reason dialog. */
  async move(inquiry: Pick<InquirySummary, 'id' | 'contactName'>, stage: InquiryStage): Promise<InquiryDetail | null> {
    let lostReason: string | undefined;
    if (stage === 'lost') {
      lostReason = await this.askWhyLost(inquiry.contactName);
      if (!lostReason) {
        void this.announcer.announce(String(this.translate.instant('inquiries.mover.notMoved', { name: inquiry.contactName })));
        return null;
      }
    }
    const saved = await this.api.moveStage(inquiry.id, stage, lostReason);
    void this.announcer.announce(
      String(this.translate.instant('inquiries.mover.moved', { name: inquiry.contactName, stage: STAGE_LABELS[stage] })),
    );
    return saved;
  }

  private async askWhyLost(contactName: string): Promise<string | undefined> {
    const ref = this.dialog.open<LostReasonDialog, LostReasonData, string>(LostReasonDialog, {
      data: { contactName },
      width: '30rem',
      ariaLabelledBy: 'lost-title',
    });
    return firstValueFrom(ref.afterClosed());
  }
}
