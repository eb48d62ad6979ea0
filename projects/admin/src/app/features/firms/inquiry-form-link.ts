import { CdkCopyToClipboard } from '@angular/cdk/clipboard';
import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';

import { inquiryFormSnippet, inquiryFormUrl } from './inquiry-form-address';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';

/** Settings: where prospects send inquiries, with copy buttons for the address and a website link. */
@Component({
  selector: 'lb-inquiry-form-link',
  imports: [TranslatePipe, CdkCopyToClipboard, MatButtonModule, MatIconModule],
  template: `
    <section class="inquiry-form" aria-labelledby="inquiry-form-heading">
      <h2 id="inquiry-form-heading">{{ 'firms.inquiryFormLink.yourInquiryForm' | translate }}</h2>
      <p class="lead">{{ 'firms.inquiryFormLink.prospectsDescribeTheirWork' | translate }}</p>
      <p class="row">
        <a class="url" [href]="url()" target="_blank" rel="noopener">{{ url() }}</a>
        <button
          mat-stroked-button
          type="button"
          [cdkCopyToClipboard]="url()"
          (cdkCopyToClipboardCopied)="copied($event, 'firms.snack.address')"
        >
          <mat-icon aria-hidden="true">content_copy</mat-icon>{{ 'firms.inquiryFormLink.copyAddress' | translate }}
        </button>
      </p>
      <label for="inquiry-form-snippet">{{ 'firms.inquiryFormLink.linkForYourWebsite' | translate }}</label>
      <textarea id="inquiry-form-snippet" readonly rows="3">{{ snippet() }}</textarea>
      <p class="row">
        <button
          mat-stroked-button
          type="button"
          [cdkCopyToClipboard]="snippet()"
          (cdkCopyToClipboardCopied)="copied($event, 'firms.snack.websiteLink')"
        >
          <mat-icon aria-hidden="true">code</mat-icon>{{ 'firms.inquiryFormLink.copyWebsiteLink' | translate }}
        </button>
      </p>
    </section>
  `,
  styles: `
    .inquiry-form {
      margin-top: 2rem;
    }
    .row {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 0.75rem;
    }
    .url {
      overflow-wrap: anywhere;
    }
    textarea {
      display: block;
      box-sizing: border-box;
      width: 100%;
      margin-top: 0.25rem;
      font-family: monospace;
      font-size: 0.85rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InquiryFormLink {
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);
  private readonly origin = inject(DOCUMENT).location?.origin ?? '';
  readonly slug = input.required<string>();
  readonly firmName = input.required<string>();
  protected readonly url = computed(() => inquiryFormUrl(this.origin, this.slug()));
  protected readonly snippet = computed(() => inquiryFormSnippet(this.url(), this.firmName()));

  protected copied(ok: boolean, what: string): void {
    const words: string = ok
      ? (this.translate.instant('firms.snack.copied', { what: this.translate.instant(what) as string }) as string)
      : (this.translate.instant('firms.snack.copyFailed') as string);
    this.snackBar.open(words, this.translate.instant('ui.snack.close') as string, { duration: 4000 });
  }
}
