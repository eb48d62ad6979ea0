import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { Session } from '../../core/auth/session';
import { firmToday, toIsoDate } from '../../shared/forms/iso-date';
import { EXPORT_KINDS, defaultExportRange, exportHref, exportRangeProblem } from './export-range';
import { TranslatePipe } from '@ngx-translate/core';

/** Spreadsheet files (CSV) for the accountant: invoices, payments, refunds, credit notes and clients for a range of days. */
@Component({
  selector: 'lb-cash-exports',
  imports: [TranslatePipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  template: `
    <section class="cash-section" aria-labelledby="exports-heading">
      <h2 id="exports-heading">{{ 'cash.cashExports.filesForYourAccountant' | translate }}</h2>
      <p class="note">
        {{ 'cash.cashExports.spreadsheetFilesCsvIn' | translate }}
      </p>
      <div class="range" role="group" [attr.aria-label]="'cash.cashExports.daysToInclude' | translate">
        <mat-form-field subscriptSizing="dynamic">
          <mat-label>{{ 'cash.cashExports.firstDay' | translate }}</mat-label>
          <input
            matInput
            type="date"
            [value]="from()"
            (change)="from.set($any($event.target).value)"
            [attr.aria-invalid]="problem()?.field === 'from'"
          />
          @if (problem()?.field === 'from') {
            <mat-hint class="field-error">{{ problem()?.message }}</mat-hint>
          }
        </mat-form-field>
        <mat-form-field subscriptSizing="dynamic">
          <mat-label>{{ 'cash.cashExports.lastDay' | translate }}</mat-label>
          <input
            matInput
            type="date"
            [value]="to()"
            (change)="to.set($any($event.target).value)"
            [attr.aria-invalid]="problem()?.field === 'to'"
          />
          @if (problem()?.field === 'to') {
            <mat-hint class="field-error">{{ problem()?.message }}</mat-hint>
          }
        </mat-form-field>
      </div>
      <div class="downloads">
        @for (choice of kinds; track choice.kind) {
          @if (problem()) {
            <button mat-stroked-button type="button" disabled>
              <mat-icon aria-hidden="true">download</mat-icon>
              {{ choice.label }}
            </button>
          } @else {
            <a mat-stroked-button [href]="href(choice.kind)" download>
              <mat-icon aria-hidden="true">download</mat-icon>
              {{ choice.label }}<span class="lb-visually-hidden"> {{ 'cash.cashExports.csvFile' | translate }}</span>
            </a>
          }
        }
      </div>
    </section>
  `,
  styleUrl: './cash-section.scss',
  styles: `
    .range {
      display: flex;
      flex-wrap: wrap;
      gap: 1.25rem 1rem;
      margin: 0.5rem 0 1rem;
    }
    .downloads {
      display: flex;
      flex-wrap: wrap;
      gap: 0.5rem;
    }
    .field-error {
      color: #7a2418;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CashExports {
  protected readonly kinds = EXPORT_KINDS;
  // the firm's today (the day the API dates money by), not the viewer's
  private readonly initial = defaultExportRange(toIsoDate(firmToday(inject(Session).user()?.timeZone)) ?? '2026-01-01');
  protected readonly from = signal(this.initial.from);
  protected readonly to = signal(this.initial.to);
  protected readonly problem = computed(() => exportRangeProblem(this.from(), this.to()));

  protected href(kind: (typeof EXPORT_KINDS)[number]['kind']): string {
    return exportHref(kind, this.from(), this.to());
  }
}
