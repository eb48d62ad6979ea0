import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { TranslatePipe } from '@ngx-translate/core';

export interface ConfirmDialogData {
  readonly title: string;
  readonly message: string;
  readonly confirmLabel: string;
  /** values for `{{name}}` in the three texts when they are translation keys */
  readonly params?: Readonly<Record<string, unknown>>;
}

/** A yes/no question before anything that is awkward to undo. Closes with `true` on yes. Texts may be translation keys. */
@Component({
  selector: 'lb-confirm-dialog',
  imports: [TranslatePipe, MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>{{ data.title | translate: data.params }}</h2>
    <mat-dialog-content>
      <p>{{ data.message | translate: data.params }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false">{{ 'ui.confirm.cancel' | translate }}</button>
      <button mat-flat-button type="button" [mat-dialog-close]="true">{{ data.confirmLabel | translate: data.params }}</button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmDialog {
  protected readonly data = inject<ConfirmDialogData>(MAT_DIALOG_DATA);
}
