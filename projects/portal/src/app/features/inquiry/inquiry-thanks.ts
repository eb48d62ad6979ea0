import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { Title } from '@angular/platform-browser';
import { ActivatedRoute } from '@angular/router';
import type { FirmLookup } from './firm-lookup';
import { PublicFrame } from './public-frame';

/** Where both the hydrated form and the plain post (303 from the host) land once it is filed. */
@Component({
  selector: 'lb-inquiry-thanks',
  imports: [MatIconModule, PublicFrame],
  template: `
    <lb-public-frame>
      <h1>Thank you</h1>
      <div class="lb-success" role="status">
        <mat-icon aria-hidden="true">mark_email_read</mat-icon>
        <p>
          {{ firmName ?? 'The firm' }} has your inquiry and will be in touch soon. A confirmation e-mail is on its way to you; if it has not
          arrived in a few minutes, look in your spam folder.
        </p>
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
    inject(Title).setTitle(this.firmName ? `Thank you · ${this.firmName}` : 'Thank you');
  }
}
