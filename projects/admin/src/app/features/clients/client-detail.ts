import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, OnInit, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { ClientDetail } from '@layerbook/contracts';
import { toProblem } from '../../core/errors/problem';
import { LeadSafetyNote } from '../../shared/ui/lead-safety-note';
import { STAGE_LABELS, isStage } from '../../shared/ui/stage-words';
import { ClientApi } from './client-api';
import { ClientForm } from './client-form';
import { CLIENT_KIND_LABELS } from './client-words';
import { ContactForm } from './contact-form';
import { SiteForm } from './site-form';

/** Which site form is open: a new one, one site's, or none (one at a time keeps labels unique). */
type SiteEditing = 'new' | string | null;

@Component({
  selector: 'lb-client-detail',
  imports: [
    ClientForm,
    ContactForm,
    DatePipe,
    LeadSafetyNote,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    RouterLink,
    SiteForm,
  ],
  templateUrl: './client-detail.html',
  styleUrl: './client-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClientDetailPage implements OnInit {
  private readonly api = inject(ClientApi);
  private readonly snackBar = inject(MatSnackBar);

  /** From the route (withComponentInputBinding). */
  readonly id = input.required<string>();

  protected readonly client = signal<ClientDetail | null>(null);
  protected readonly isLoading = signal(true);
  protected readonly loadMessage = signal<string | null>(null);
  protected readonly isEditing = signal(false);
  protected readonly siteEditing = signal<SiteEditing>(null);
  protected readonly kindLabels = CLIENT_KIND_LABELS;

  ngOnInit(): void {
    void this.reload();
  }

  protected stageLabel(stage: string): string {
    return isStage(stage) ? STAGE_LABELS[stage] : stage;
  }

  protected async afterSave(what: string): Promise<void> {
    this.isEditing.set(false);
    this.siteEditing.set(null);
    this.snackBar.open(what, 'Close', { duration: 4000 });
    await this.reload();
  }

  private async reload(): Promise<void> {
    try {
      this.client.set(await this.api.get(this.id()));
    } catch (error) {
      this.loadMessage.set(toProblem(error).title);
    } finally {
      this.isLoading.set(false);
    }
  }
}
