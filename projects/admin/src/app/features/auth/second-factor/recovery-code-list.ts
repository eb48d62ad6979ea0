import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import { TranslatePipe } from '@ngx-translate/core';

/** Recovery codes, shown once: copy or download them, say they are kept, then go on. */
@Component({
  selector: 'lb-recovery-code-list',
  imports: [MatButtonModule, MatCheckboxModule, MatIconModule, TranslatePipe],
  template: `
    <section class="codes-box" aria-labelledby="recovery-codes-heading">
      <h2 id="recovery-codes-heading">{{ 'auth.recoveryCodes.heading' | translate }}</h2>
      <p>{{ 'auth.recoveryCodes.intro' | translate }}</p>
      <ol class="codes" translate="no">
        @for (code of codes(); track code) {
          <li>
            <code>{{ code }}</code>
          </li>
        }
      </ol>
      <div class="lb-form-actions">
        <button mat-stroked-button type="button" (click)="copy()">
          <mat-icon aria-hidden="true">content_copy</mat-icon>{{ 'auth.recoveryCodes.copy' | translate }}
        </button>
        <button mat-stroked-button type="button" (click)="download()">
          <mat-icon aria-hidden="true">download</mat-icon>{{ 'auth.recoveryCodes.download' | translate }}
        </button>
      </div>
      <p class="lb-aside" role="status">
        @if (copied()) {
          {{ 'auth.recoveryCodes.copied' | translate }}
        }
      </p>
      <mat-checkbox [checked]="kept()" (change)="kept.set($event.checked)">{{ 'auth.recoveryCodes.kept' | translate }}</mat-checkbox>
      <div class="lb-form-actions">
        <button mat-flat-button type="button" [disabled]="!kept()" (click)="done.emit()">
          {{ 'auth.recoveryCodes.continue' | translate }}
        </button>
      </div>
    </section>
  `,
  styleUrl: './second-factor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecoveryCodeList {
  readonly codes = input.required<readonly string[]>();
  readonly done = output();

  protected readonly kept = signal(false);
  protected readonly copied = signal(false);

  protected async copy(): Promise<void> {
    await navigator.clipboard?.writeText(this.codes().join('\n'));
    this.copied.set(true);
  }

  protected download(): void {
    const url = URL.createObjectURL(new Blob([`${this.codes().join('\n')}\n`], { type: 'text/plain' }));
    const link = document.createElement('a');
    link.href = url;
    link.download = 'layerbook-recovery-codes.txt';
    link.click();
    URL.revokeObjectURL(url);
  }
}
