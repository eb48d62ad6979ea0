import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { Title } from '@angular/platform-browser';
import { ActivatedRoute } from '@angular/router';
import type { FirmLookup } from './firm-lookup';
import { PublicFrame } from './public-frame';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

/** Where both the hydrated form and the plain post (303 from the host) land once it is filed. */
@Component({
  selector: 'lb-inquiry-thanks',
  imports: [MatIconModule, PublicFrame, TranslatePipe],
  template: `
    <lb-public-frame>
      <h1>{{ 'inquiry.thanks.title' | translate }}</h1>
      <div class="lb-success" role="status">
        <mat-icon aria-hidden="true">mark_email_read</mat-icon>
        <p>{{ (firmName ? 'inquiry.thanks.text' : 'inquiry.thanks.textNoFirm') | translate: { firm: firmName } }}</p>
      </div>
    </lb-public-frame>
  `,
  styles: `
    .lb-success p {
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryThanks {
  private readonly lookup = inject(ActivatedRoute).snapshot.data['lookup'] as FirmLookup | undefined;

  protected readonly firmName = this.lookup?.kind === 'found' ? this.lookup.firm.name : null;

  constructor() {
    const translate = inject(TranslateService);
    inject(Title).setTitle(
      translate.instant(this.firmName ? 'inquiry.thanks.titleFor' : 'inquiry.thanks.title', { firm: this.firmName }) as string,
    );
  }
}
