import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, resource, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { TranslatePipe, TranslateService } from '@ngx-translate/core';
import type { ProposalVersionStatus, ProposalVersionSummary, ProposalVersionView } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { problemMessage, toProblem } from '../../core/errors/problem';
import { CalendarDatePipe } from '../../shared/ui/calendar-date-pipe';
import { ConfirmDialog, type ConfirmDialogData } from '../../shared/ui/confirm-dialog';
import { FormAlert } from '../../shared/ui/form-alert';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { EstimateApi } from './estimate-api';
import { ProposalApi } from './proposal-api';
import { ProposalEditor } from './proposal-editor';
import { versionStatus } from './proposal-words';

/** What went wrong with one version's action, said beside that version. */
interface VersionMessage {
  readonly id: string;
  readonly text: string;
  /** the server asked for the client's e-mail: offer the way to the client's page */
  readonly needsClientEmail: boolean;
}

/** Statuses whose full record says more than the summary (who accepted, what they said). */
const READ_IN_FULL: ReadonlySet<ProposalVersionStatus> = new Set(['draft', 'accepted', 'declined', 'changes_requested']);

/**
 * The proposal versions of one estimate: make a draft from the saved numbers, change it, download
 * its PDF and send it to the client; sent versions stay as they were sent.
 */
@Component({
  selector: 'lb-proposal-versions',
  imports: [
    CalendarDatePipe,
    DatePipe,
    FormAlert,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MoneyPipe,
    ProposalEditor,
    RouterLink,
    TranslatePipe,
  ],
  templateUrl: './proposal-versions.html',
  styleUrl: './proposal-versions.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposalVersions {
  private readonly translate = inject(TranslateService);
  private readonly estimates = inject(EstimateApi);
  protected readonly api = inject(ProposalApi);
  private readonly dialog = inject(MatDialog);

  /** the estimate's id, from the route (withComponentInputBinding) */
  readonly id = input.required<string>();

  private readonly loadedEstimate = resource({ params: () => this.id(), loader: ({ params }) => this.estimates.get(params) });
  /** the client's address for the send confirmation; without it the draft's own address is named */
  private readonly client = resource({
    params: () => (this.loadedEstimate.hasValue() ? this.loadedEstimate.value().clientId : undefined),
    loader: ({ params }) => this.estimates.client(params),
  });
  /** the versions, and the full record of those whose summary says too little (who accepted, what they said) */
  private readonly loadedVersions = resource({
    params: () => this.id(),
    loader: async ({ params }) => {
      const { items } = await this.api.list(params);
      const views = await Promise.all(items.filter((v) => READ_IN_FULL.has(v.status)).map((v) => this.api.get(v.id)));
      return { items, details: new Map(views.map((v) => [v.id, v])) };
    },
  });

  protected readonly estimate = computed(() => (this.loadedEstimate.hasValue() ? this.loadedEstimate.value() : null));
  protected readonly clientEmail = computed(() => (this.client.hasValue() ? this.client.value().email : null));
  protected readonly versions = computed<readonly ProposalVersionSummary[]>(() =>
    this.loadedVersions.hasValue() ? this.loadedVersions.value().items : [],
  );
  private readonly details = computed(() =>
    this.loadedVersions.hasValue() ? this.loadedVersions.value().details : new Map<string, ProposalVersionView>(),
  );
  protected readonly isLoading = computed(() => this.loadedEstimate.isLoading() || this.loadedVersions.isLoading());
  protected readonly loadMessage = computed(() => {
    const error = this.loadedEstimate.error() ?? this.loadedVersions.error();
    return error ? problemMessage(error) : null;
  });
  /** 'new' for a new version, a version id while changing that draft */
  protected readonly editing = signal<string | null>(null);
  protected readonly busyId = signal<string | null>(null);
  protected readonly versionMessage = signal<VersionMessage | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly versionStatus = versionStatus;

  protected readonly isAccepted = computed(() => this.versions().some((v) => v.status === 'accepted'));
  protected readonly isPriced = computed(() => !!this.estimate()?.result);
  protected readonly canPropose = computed(() => this.isPriced() && !this.isAccepted());

  protected detail(id: string): ProposalVersionView | null {
    return this.details().get(id) ?? null;
  }

  /** The option the client took, and the add-ons with it ("Polished lime + Stencilled border"). */
  protected optionLabel(view: ProposalVersionView): string {
    const id = view.acceptedVariantId;
    const addOns = view.acceptedAddOnIds.map((a) => view.snapshot.addOns.find((o) => o.id === a)?.label ?? a);
    return [view.snapshot.options.find((o) => o.id === id)?.label ?? id ?? '', ...addOns].join(' + ');
  }

  protected startNew(): void {
    this.notice.set(null);
    this.versionMessage.set(null);
    this.editing.set('new');
  }

  protected startEdit(id: string): void {
    this.notice.set(null);
    this.versionMessage.set(null);
    this.editing.set(id);
  }

  protected stopEditing(): void {
    this.editing.set(null);
  }

  protected saved(view: ProposalVersionView, wasNew: boolean): void {
    this.editing.set(null);
    this.notice.set(this.words(wasNew ? 'proposals.versions.madeDraft' : 'proposals.versions.saved', { n: view.version }));
    this.loadedVersions.reload();
  }

  protected async sendToClient(version: ProposalVersionSummary): Promise<void> {
    this.notice.set(null);
    this.versionMessage.set(null);
    const email = this.clientEmail() || this.detail(version.id)?.snapshot.client.email || '';
    const isSure = await this.confirm({
      title: 'proposals.versions.sendTitle',
      message: email ? 'proposals.versions.sendTo' : 'proposals.versions.sendToClient',
      confirmLabel: 'proposals.versions.sendConfirm',
      params: { n: version.version, email },
    });
    if (!isSure) return;
    this.busyId.set(version.id);
    try {
      const sent = await this.api.send(version.id);
      this.notice.set(
        this.words(email ? 'proposals.versions.sentTo' : 'proposals.versions.sentNoEmail', {
          n: sent.version,
          email,
        }),
      );
      this.loadedVersions.reload();
    } catch (error) {
      const problem = toProblem(error);
      const errors = problem.errors ?? [];
      const needsClientEmail = errors.some((e) => e.field === 'client.email');
      const detail = problem.detail ?? problem.title;
      const text =
        errors.length > 0 ? [detail, ...errors.map((e) => e.message)].filter((t, i, all) => all.indexOf(t) === i).join(' ') : detail;
      this.versionMessage.set({ id: version.id, text, needsClientEmail });
    } finally {
      this.busyId.set(null);
    }
  }

  private words(key: string, params: Record<string, unknown>): string {
    return String(this.translate.instant(key, params));
  }

  private confirm(data: ConfirmDialogData): Promise<boolean> {
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '30rem' });
    return firstValueFrom(ref.afterClosed()).then((answer) => answer === true);
  }
}
