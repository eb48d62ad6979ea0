import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { InquiryDetail } from '@layerbook/contracts/types';
import { InquiryForm } from './inquiry-form';

/** Logging a phone call or a referral; web-form inquiries arrive by themselves. */
@Component({
  selector: 'lb-new-inquiry',
  imports: [InquiryForm, RouterLink, TranslatePipe],
  template: `
    <section class="lb-page">
      <p>
        <a routerLink="/inquiries">{{ 'inquiries.detail.back' | translate }}</a>
      </p>
      <h1>{{ 'inquiries.newInquiry.heading' | translate }}</h1>
      <p class="lb-lead">{{ 'inquiries.newInquiry.lead' | translate }}</p>
      <lb-inquiry-form (saved)="openInquiry($event)" (cancelled)="goBack()" />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewInquiry {
  private readonly translate = inject(TranslateService);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);

  protected async openInquiry(inquiry: InquiryDetail): Promise<void> {
    this.snackBar.open(
      String(this.translate.instant('inquiries.newInquiry.saved', { name: inquiry.contactName })),
      String(this.translate.instant('inquiries.close')),
      { duration: 4000 },
    );
    await this.router.navigate(['/inquiries', inquiry.id]);
  }

  protected goBack(): void {
    void this.router.navigateByUrl('/inquiries');
  }
}
