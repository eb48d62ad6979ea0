import { DatePipe } from '@angular/common';
import { httpResource } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { CHANGE_ORDER_TAX_NOTES, type ChangeOrderSummary, type ChangeOrderView, type ItemList } from '@layerbook/contracts/types';
import { firstValueFrom } from 'rxjs';
import { problemMessage } from '../../../core/errors/problem';
import { loadMessage } from '../../../shared/forms/load-message';
import { ConfirmDialog, type ConfirmDialogData } from '../../../shared/ui/confirm-dialog';
import { FormAlert } from '../../../shared/ui/form-alert';
import { ChangeOrderApi, changeOrdersUrl } from './change-order-api';
import { ChangeOrderForm } from './change-order-form';
import { changeOrderStatus, signedMoney } from './change-order-words';
import { TranslatePipe } from '@ngx-translate/core';

/**
 * The job's change orders: each with its number, title, signed amount and where it stands; add
 * one (a lump sum or priced from surfaces), change a draft, send it to the client to approve in
 * the portal. Only an approved one moves the contract sum.
 */
@Component({
  selector: 'lb-change-orders',
  imports: [TranslatePipe, DatePipe, ChangeOrderForm, FormAlert, MatButtonModule, MatIconModule, MatProgressBarModule],
  template: `
    <h2 id="change-orders-heading">{{ 'jobs.changeOrders.changeOrders' | translate }}</h2>
    <p class="hint">
      <mat-icon aria-hidden="true">info</mat-icon>
      <span>{{ 'jobs.changeOrders.sentToTheClient' | translate }}</span>
    </p>
    @if (list.isLoading() && !list.hasValue()) {
      <mat-progress-bar mode="indeterminate" [aria-label]="'jobs.changeOrders.loadingTheChangeOrders' | translate" />
    }
    <lb-form-alert [message]="failure() ?? actionMessage()" />
    @if (notice(); as text) {
      <p class="notice" role="status">{{ text }}</p>
    }
    <div class="table-wrap" tabindex="0" role="region" aria-labelledby="change-orders-heading">
      <table aria-labelledby="change-orders-heading">
        <thead>
          <tr>
            <th scope="col">{{ 'jobs.changeOrders.no' | translate }}</th>
            <th scope="col">{{ 'jobs.changeOrders.title' | translate }}</th>
            <th scope="col" class="num">{{ 'jobs.changeOrders.amount' | translate }}</th>
            <th scope="col">{{ 'jobs.changeOrders.status' | translate }}</th>
            <th scope="col">
              <span class="cdk-visually-hidden">{{ 'jobs.changeOrders.actions' | translate }}</span>
            </th>
          </tr>
        </thead>
        <tbody>
          @for (co of items(); track co.id) {
            @let s = status(co.status);
            <tr>
              <td>#{{ co.number }}</td>
              <th scope="row">{{ co.title }}</th>
              <td class="num">{{ amount(co) }}</td>
              <td>
                <span class="status"
                  ><mat-icon aria-hidden="true">{{ s.icon }}</mat-icon
                  >{{ s.word }}</span
                >
                @if (co.decidedAt) {
                  <span class="small">{{ co.decidedAt | date: 'mediumDate' }}</span>
                } @else if (co.sentAt) {
                  <span class="small">{{ 'jobs.changeOrders.sent' | translate: { sentAt: (co.sentAt | date: 'mediumDate') } }}</span>
                }
              </td>
              <td>
                @if (co.status === 'draft') {
                  <div class="row-actions">
                    <button mat-button type="button" (click)="startEdit(co)" [disabled]="busyId() === co.id">
                      {{ 'jobs.changeOrders.change' | translate }}
                    </button>
                    <button mat-stroked-button type="button" (click)="sendToClient(co)" [disabled]="busyId() === co.id">
                      <mat-icon aria-hidden="true">send</mat-icon>{{ 'jobs.changeOrders.sendToClient' | translate }}
                    </button>
                  </div>
                }
              </td>
            </tr>
          } @empty {
            <tr>
              <td colspan="5" class="muted">{{ 'jobs.changeOrders.noChangeOrdersOn' | translate }}</td>
            </tr>
          }
        </tbody>
      </table>
    </div>
    @if (editing(); as e) {
      <lb-change-order-form
        [jobId]="jobId()"
        [draft]="e === 'new' ? null : e"
        (saved)="saved($event, e === 'new')"
        (cancelled)="editing.set(null)"
      />
    } @else {
      <div class="actions">
        <button mat-stroked-button type="button" (click)="startNew()">
          <mat-icon aria-hidden="true">add</mat-icon>{{ 'jobs.changeOrders.addAChangeOrder' | translate }}
        </button>
      </div>
    }
  `,
  styleUrl: '../billing/billing-section.scss',
  styles: `
    @use 'tables';
    .row-actions {
      display: flex;
      flex-wrap: wrap;
      gap: 0.25rem 0.5rem;
      justify-content: flex-end;
    }
    .notice {
      margin: 0 0 0.75rem;
    }
    /*
     * A phone: each change order a card — number and title, then amount and status on one line, then
     * its buttons — with no sideways scroll. The header row is still read aloud.
     */
    @media (max-width: 599.98px) {
      @include tables.table-as-cards;
      tbody tr {
        display: grid;
        grid-template-columns: auto 1fr;
        align-items: baseline;
        gap: 0.2rem 0.6rem;
      }
      tbody td.num {
        text-align: left;
      }
      tbody td[colspan] {
        grid-column: 1 / -1;
      }
      .row-actions {
        justify-content: flex-start;
      }
      tbody td:last-child {
        grid-column: 1 / -1;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangeOrders {
  private readonly api = inject(ChangeOrderApi);
  private readonly dialog = inject(MatDialog);
  private readonly locale = inject(LOCALE_ID);

  readonly jobId = input.required<string>();
  /** a change order was added, changed or sent (the job page may read its billing again) */
  readonly changed = output<ChangeOrderView>();

  protected readonly list = httpResource<ItemList<ChangeOrderSummary>>(() => changeOrdersUrl(this.jobId()));
  protected readonly items = computed(() => (this.list.hasValue() ? this.list.value().items : []));
  protected readonly failure = loadMessage(this.list);
  /** 'new' while adding, a draft's full view while changing it */
  protected readonly editing = signal<'new' | ChangeOrderView | null>(null);
  protected readonly busyId = signal<string | null>(null);
  protected readonly actionMessage = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly status = changeOrderStatus;

  protected amount(co: ChangeOrderSummary): string {
    return signedMoney(co.amount, co.currency, this.locale);
  }

  protected startNew(): void {
    this.clearMessages();
    this.editing.set('new');
  }

  protected async startEdit(co: ChangeOrderSummary): Promise<void> {
    this.clearMessages();
    this.busyId.set(co.id);
    try {
      this.editing.set(await this.api.get(co.id));
    } catch (error) {
      this.actionMessage.set(problemMessage(error));
    } finally {
      this.busyId.set(null);
    }
  }

  protected saved(view: ChangeOrderView, wasNew: boolean): void {
    this.editing.set(null);
    const what = `Change order #${view.number} ${wasNew ? 'added as a draft' : 'saved'}: ${signedMoney(view.amount, view.currency, this.locale)}.`;
    const untaxed = view.taxNote ? CHANGE_ORDER_TAX_NOTES[view.taxNote] : null;
    this.notice.set([what, untaxed, 'Send it to the client when it is ready.'].filter(Boolean).join(' '));
    this.list.reload();
    this.changed.emit(view);
  }

  protected async sendToClient(co: ChangeOrderSummary): Promise<void> {
    this.clearMessages();
    const isSure = await this.confirm({
      title: 'Send the change order?',
      message: `Send change order #${co.number} (${this.amount(co)}) to the client? Once sent, it cannot change; the client approves or declines it in the portal.`,
      confirmLabel: 'Send',
    });
    if (!isSure) return;
    this.busyId.set(co.id);
    try {
      const sent = await this.api.send(co.id);
      this.notice.set(`Change order #${sent.number} sent. The client gets an e-mail with a link to read and approve it.`);
      this.list.reload();
      this.changed.emit(sent);
    } catch (error) {
      this.actionMessage.set(problemMessage(error));
    } finally {
      this.busyId.set(null);
    }
  }

  private clearMessages(): void {
    this.notice.set(null);
    this.actionMessage.set(null);
  }

  private confirm(data: ConfirmDialogData): Promise<boolean> {
    const ref = this.dialog.open<ConfirmDialog, ConfirmDialogData, boolean>(ConfirmDialog, { data, width: '30rem' });
    return firstValueFrom(ref.afterClosed()).then((answer) => answer === true);
  }
}
