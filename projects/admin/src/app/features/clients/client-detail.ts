import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import { CLIENT_KIND_LABELS, STAGE_LABELS, type ClientDetail } from '@layerbook/contracts/types';
import { loadMessage } from '../../shared/forms/load-message';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { clientUrl } from './client-api';
import { ClientForm } from './client-form';
import { ClientMerge } from './client-merge';
import { ContactForm } from './contact-form';
import { SiteForm } from './site-form';

/** Which site form is open: `'new'`, a site's id, or none (one at a time keeps labels unique). */
type SiteEditing = string | null;

@Component({
  selector: 'lb-client-detail',
  imports: [
    ClientForm,
    ClientMerge,
    ContactForm,
    DatePipe,
    LeadSafetyNote,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    RouterLink,
    SiteForm,
    TranslatePipe,
  ],
  templateUrl: './client-detail.html',
  styleUrl: './client-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientDetailPage {
  private readonly snackBar = inject(MatSnackBar);
  private readonly translate = inject(TranslateService);

  /** From the route (withComponentInputBinding). */
  readonly id = input.required<string>();

  protected readonly detail = httpResource<ClientDetail>(() => clientUrl(this.id()));
  protected readonly client = computed(() => (this.detail.hasValue() ? this.detail.value() : null));
  protected readonly loadMessage = loadMessage(this.detail);
  protected readonly isEditing = signal(false);
  protected readonly siteEditing = signal<SiteEditing>(null);
  protected readonly kindLabels = CLIENT_KIND_LABELS;
  protected readonly stageLabels = STAGE_LABELS;

  /** Each form answers (`whatKey` is the snack bar's words) with its own part only, so the page reads the whole client again. */
  protected afterSave(whatKey: string): void {
    this.isEditing.set(false);
    this.siteEditing.set(null);
    this.snackBar.open(String(this.translate.instant(whatKey)), String(this.translate.instant('clients.close')), { duration: 4000 });
    this.detail.reload();
  }
}
