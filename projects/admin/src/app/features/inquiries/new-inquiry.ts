import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import type { InquiryDetail } from '@layerbook/contracts/types';
import { InquiryForm } from './inquiry-form';

/** Logging a phone call or a referral; web-form inquiries arrive by themselves. */
@Component({
  selector: 'lb-new-inquiry',
  imports: [InquiryForm, RouterLink],
  template: `
    <section class="lb-page">
      <p><a routerLink="/inquiries">Back to inquiries</a></p>
      <h1>Log an inquiry</h1>
      <p class="lb-lead">
        For a phone call, a referral or a chat at the showroom. Only the name and where it came from are needed now; fill in the rest as you
        learn it.
      </p>
      <lb-inquiry-form (saved)="openInquiry($event)" (cancelled)="goBack()" />
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewInquiry {
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);

  protected async openInquiry(inquiry: InquiryDetail): Promise<void> {
    this.snackBar.open(`Inquiry from ${inquiry.contactName} saved.`, 'Close', { duration: 4000 });
    await this.router.navigate(['/inquiries', inquiry.id]);
  }

  protected goBack(): void {
    void this.router.navigateByUrl('/inquiries');
  }
}
