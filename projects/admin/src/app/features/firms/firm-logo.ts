import { ChangeDetectionStrategy, Component, DestroyRef, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { PHOTO_CONTENT_TYPES, PHOTO_UPLOAD_MAX_BYTES, type FirmSettings } from '@layerbook/contracts/types';
import { photoProblemText } from '../../../../../shared/photos/photo-picks';
import { FirmApi } from './firm-api';
import { logoPickProblem } from './logo-pick';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The firm's logo, printed top left on invoices and credit notes: a preview of the one saved (or
 * the one just chosen, before it is sent), "Choose a logo", "Remove". The owner changes it; the
 * server decodes the file and answers with the profile, which goes back to the page.
 */
@Component({
  selector: 'lb-firm-logo',
  imports: [TranslatePipe, MatButtonModule, MatIconModule, MatProgressBarModule],
  template: `
    <div class="logo-picker" role="group" aria-labelledby="logo-label">
      <span class="label" id="logo-label">{{ 'firms.firmLogo.logo' | translate }}</span>
      <div class="preview">
        @if (previewUrl() ?? logoUrl(); as src) {
          <img [src]="src" [alt]="'firms.firmLogo.yourFirmSLogo' | translate" />
        } @else {
          <mat-icon aria-hidden="true">image</mat-icon>
          <span>{{ 'firms.firmLogo.noLogoYetInvoices' | translate }}</span>
        }
      </div>
      @if (isBusy()) {
        <mat-progress-bar mode="indeterminate" [aria-label]="'firms.firmLogo.savingTheLogo' | translate" />
      }
      @if (problem(); as message) {
        <p class="lb-form-alert" role="alert">{{ message }}</p>
      }
      @if (canEdit()) {
        <div class="actions">
          <input #picker type="file" hidden [accept]="accept" (change)="uploadLogo(picker)" />
          <button mat-stroked-button type="button" [disabled]="isBusy()" (click)="picker.click()">
            <mat-icon aria-hidden="true">upload</mat-icon>
            {{ logoUrl() ? ('firms.firmLogo.chooseAnotherLogo' | translate) : ('firms.firmLogo.chooseALogo' | translate) }}
          </button>
          @if (logoUrl()) {
            <button mat-button type="button" [disabled]="isBusy()" (click)="removeLogo()">
              {{ 'firms.firmLogo.removeTheLogo' | translate }}
            </button>
          }
        </div>
        <span class="hint">{{ 'firms.firmLogo.aJpegPngOr' | translate }}</span>
      }
    </div>
  `,
  styles: `
    .logo-picker {
      display: grid;
      gap: 0.5rem;
    }
    .label {
      font-weight: 600;
    }
    .preview {
      display: flex;
      align-items: center;
      gap: 0.75rem;
      min-height: 4.5rem;
      padding: 0.75rem 1rem;
      border: 2px dashed var(--mat-sys-outline-variant);
      border-radius: 8px;
      color: var(--mat-sys-on-surface-variant);
    }
    .preview img {
      max-width: 100%;
      max-height: 6rem;
      object-fit: contain;
    }
    .preview mat-icon {
      flex: none;
    }
    .actions {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem;
    }
    .hint {
      font-size: 0.875rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FirmLogo {
  private readonly api = inject(FirmApi);

  readonly logoUrl = input<string | null>(null);
  readonly canEdit = input(false);
  /** the profile as the server answered after a change */
  readonly changed = output<FirmSettings>();

  protected readonly accept = PHOTO_CONTENT_TYPES.join(',');
  protected readonly previewUrl = signal<string | null>(null);
  protected readonly isBusy = signal(false);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    inject(DestroyRef).onDestroy(() => this.showPreview(null));
  }

  protected async uploadLogo(picker: HTMLInputElement): Promise<void> {
    const file = picker.files?.[0];
    picker.value = '';
    if (!file) return;
    const refusal = logoPickProblem(file, PHOTO_UPLOAD_MAX_BYTES);
    this.problem.set(refusal);
    if (refusal) return;
    this.showPreview(URL.createObjectURL(file));
    await this.run(() => this.api.uploadLogo(file));
  }

  protected async removeLogo(): Promise<void> {
    await this.run(() => this.api.removeLogo());
  }

  private async run(change: () => Promise<FirmSettings>): Promise<void> {
    this.isBusy.set(true);
    try {
      this.changed.emit(await change());
      this.problem.set(null);
    } catch (error) {
      this.problem.set(photoProblemText(error));
    } finally {
      this.showPreview(null);
      this.isBusy.set(false);
    }
  }

  private showPreview(url: string | null): void {
    const old = this.previewUrl();
    if (old) URL.revokeObjectURL(old);
    this.previewUrl.set(url);
  }
}
